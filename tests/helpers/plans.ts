import { feetToMetres } from '../../shared/units';
import { emptyVisitPlan, type VisitPlan } from '../../shared/visit-plan';
import { suggestModels } from '../../shared/visit-suggestions';

// A house with a detached garage and a crawl space entered from outside, a depth camera on a
// sunny day: three models. Two ground-floor rooms, 12 × 15 ft and 10 × 10 ft.
export function housePlan(overrides: Partial<VisitPlan> = {}): VisitPlan {
  const plan: VisitPlan = {
    ...emptyVisitPlan(),
    cameraClass: 'tripod_depth',
    conditions: { directSun: true, outdoorBlocked: false },
    structures: [
      { key: 's-house', kind: 'main_dwelling', name: 'House', reachableInside: true, inScope: true, scopeNote: '' },
      { key: 's-garage', kind: 'detached_garage', name: 'Garage', reachableInside: false, inScope: true, scopeNote: '' },
      { key: 's-crawl', kind: 'crawl_space', name: 'Crawl space', reachableInside: false, inScope: true, scopeNote: '' },
    ],
    rooms: [
      { key: 'p-kitchen', name: 'Kitchen', level: 'ground', lengthM: feetToMetres(12), widthM: feetToMetres(15) },
      { key: 'p-hall', name: 'Hall', level: 'ground', lengthM: feetToMetres(10), widthM: feetToMetres(10) },
    ],
    startLevel: 'ground',
    hazards: ['standing_water'],
    onSite: { arrivedAt: '2026-11-30T09:00:00.000Z', leftAt: null },
    ...overrides,
  };
  return { ...plan, models: overrides.models ?? suggestModels(plan), modelsAccepted: true };
}
