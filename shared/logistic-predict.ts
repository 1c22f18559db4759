// A fitted logistic model's probability for one record: small and free of the matrix library,
// so the phone computes the hint as the record changes.
export const sigmoid = (z: number) => (z >= 0 ? 1 / (1 + Math.exp(-z)) : Math.exp(z) / (1 + Math.exp(z)));

// coefficients: intercept first, then one per fact, in the facts' order.
export function predictProbability(coefficients: number[], x: number[]): number {
  let z = coefficients[0];
  for (let j = 0; j < x.length; j++) z += coefficients[j + 1] * x[j];
  return sigmoid(z);
}
