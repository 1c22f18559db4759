// Demo visit plans (invented, like the whole demo): one for each demo job that was submitted,
// made from its first record as the technician would have planned it at the door, with a time
// on site that runs over or under the plan by a seeded amount.
import type { CaptureRecord } from '../../shared/capture-record';
import type { LossType } from '../../shared/jobs';
import { suggestedHazards } from '../../shared/visit-hazards';
import { emptyVisitPlan, type PlannedStructure, type VisitPlan } from '../../shared/visit-plan';
import { DEFAULT_CAMERA_CLASS_SETTINGS } from '../../shared/visit-settings';
import { suggestModels, suggestStartLevel, visitEstimate } from '../../shared/visit-suggestions';

export function demoPlan(record: CaptureRecord, lossType: LossType, visitDate: string, rand: () => number) {
  const structures: PlannedStructure[] = [
    { key: 's-house', kind: 'main_dwelling', name: 'House', reachableInside: true, inScope: true, scopeNote: '' },
    ...(record.levels.some((l) => l.level === 'attic')
      ? [{ key: 's-attic', kind: 'attic' as const, name: 'Attic', reachableInside: true, inScope: true, scopeNote: '' }]
      : []),
  ];
  const base: VisitPlan = {
    ...emptyVisitPlan(),
    structures,
    cameraClass: record.cameraClass,
    conditions: { directSun: rand() < 0.4, outdoorBlocked: false },
    units: record.units,
    rooms: record.rooms.map((r) => ({ key: r.key, name: r.name, level: r.level, lengthM: r.lengthM, widthM: r.widthM })),
    hazards: suggestedHazards(lossType, structures).slice(0, 2),
  };
  const plan: VisitPlan = { ...base, models: suggestModels(base), modelsAccepted: true, startLevel: suggestStartLevel(base) };
  const settings = record.cameraClass ? DEFAULT_CAMERA_CLASS_SETTINGS[record.cameraClass] : null;
  plan.kitTicked = settings ? settings.kitItems.filter(() => rand() < 0.9) : [];
  const planned = visitEstimate(plan, settings).minutes;
  const arrived = new Date(`${visitDate}T${String(8 + Math.floor(rand() * 6)).padStart(2, '0')}:15:00.000Z`);
  // Actual time: from 15 % under to 40 % over the plan.
  const actual = planned === null ? null : Math.round(planned * (0.85 + rand() * 0.55));
  plan.onSite = {
    arrivedAt: arrived.toISOString(),
    leftAt: actual === null ? null : new Date(arrived.getTime() + actual * 60_000).toISOString(),
  };
  return { plan, planned, actual, createdAt: arrived };
}
