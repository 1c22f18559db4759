// How well predicted probabilities did on records the model never saw: the area under the ROC
// curve with its 95 % interval (Hanley & McNeil 1982), the Brier score, and a reliability table.

// AUC from its definition: the share of (came back, did not) pairs in which the record that came
// back had the higher probability, ties counting one half.
export function auc(probabilities: number[], outcomes: number[]): number | null {
  const positives = probabilities.filter((_, i) => outcomes[i] === 1);
  const negatives = probabilities.filter((_, i) => outcomes[i] === 0);
  if (positives.length === 0 || negatives.length === 0) return null;
  let wins = 0;
  for (const p of positives) for (const q of negatives) wins += p > q ? 1 : p === q ? 0.5 : 0;
  return wins / (positives.length * negatives.length);
}

// Hanley, J. A. & McNeil, B. J. (1982), Radiology 143:29–36, equation for SE(A).
export function aucInterval(area: number, positives: number, negatives: number) {
  const q1 = area / (2 - area);
  const q2 = (2 * area * area) / (1 + area);
  const variance =
    (area * (1 - area) + (positives - 1) * (q1 - area * area) + (negatives - 1) * (q2 - area * area)) / (positives * negatives);
  const se = Math.sqrt(Math.max(variance, 0));
  return { estimate: area, se, low: Math.max(0, area - 1.96 * se), high: Math.min(1, area + 1.96 * se) };
}

// Brier (1950): the mean squared difference between the probability and the outcome.
export function brierScore(probabilities: number[], outcomes: number[]): number | null {
  if (probabilities.length === 0) return null;
  return probabilities.reduce((sum, p, i) => sum + (p - outcomes[i]) ** 2, 0) / probabilities.length;
}

export type ReliabilityRow = { group: number; n: number; meanPredicted: number; observed: number };

// Records sorted by predicted probability and cut into (up to) ten groups of near-equal size;
// each group's mean prediction against the share that came back.
export function reliabilityTable(probabilities: number[], outcomes: number[], groups = 10): ReliabilityRow[] {
  const order = probabilities.map((p, i) => ({ p, y: outcomes[i] })).sort((a, b) => a.p - b.p);
  const count = Math.min(groups, order.length);
  const rows: ReliabilityRow[] = [];
  for (let g = 0; g < count; g++) {
    const slice = order.slice(Math.floor((g * order.length) / count), Math.floor(((g + 1) * order.length) / count));
    if (slice.length === 0) continue;
    rows.push({
      group: g + 1,
      n: slice.length,
      meanPredicted: slice.reduce((s, r) => s + r.p, 0) / slice.length,
      observed: slice.reduce((s, r) => s + r.y, 0) / slice.length,
    });
  }
  return rows;
}
