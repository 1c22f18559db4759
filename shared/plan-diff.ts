// What differs between two versions of a visit plan, section by section in the plan's words:
// for the conflict choice, and to see that two saves hold the same facts.
import { CAMERA_CLASS_LABELS, HAZARD_LABELS, LEVEL_LABELS, SPLIT_REASON_LABELS } from './capture-record';
import { fromMetres, roundTo } from './units';
import { PLAN_STRUCTURE_LABELS, type VisitPlan } from './visit-plan';

export type PlanDifference = { path: string; label: string; before: string; after: string };

const none = (text: string) => text || '—';
const yesNo = (value: boolean) => (value ? 'yes' : 'no');

function sections(plan: VisitPlan): [string, string, string][] {
  const size = (m: number | null) => (m === null ? '?' : String(roundTo(fromMetres(m, plan.units), 1)));
  return [
    [
      'structures',
      'Structures',
      plan.structures
        .map(
          (s) =>
            `${s.name.trim() || PLAN_STRUCTURE_LABELS[s.kind]} (${s.inScope ? 'in scope' : 'not in scope'}, ${s.reachableInside ? 'reached inside' : 'no inside access'})`,
        )
        .join('; '),
    ],
    ['cameraClass', 'Camera', plan.cameraClass ? CAMERA_CLASS_LABELS[plan.cameraClass] : ''],
    [
      'conditions',
      'Conditions',
      `direct sun ${yesNo(plan.conditions.directSun)}, outdoors ruled out ${yesNo(plan.conditions.outdoorBlocked)}`,
    ],
    [
      'models',
      'Models',
      plan.models
        .map((m) => `${m.structureNote}${m.splitReason ? ` (${SPLIT_REASON_LABELS[m.splitReason]}: ${m.splitNote})` : ''}`)
        .join('; '),
    ],
    ['startLevel', 'Start on', plan.startLevel ? LEVEL_LABELS[plan.startLevel] : ''],
    ['rooms', 'Rooms', plan.rooms.map((r) => `${r.name} ${size(r.lengthM)} × ${size(r.widthM)} ${plan.units}`).join('; ')],
    ['hazards', 'Hazards', plan.hazards.map((h) => HAZARD_LABELS[h]).join(', ')],
    ['kitTicked', 'Kit ticked', plan.kitTicked.join(', ')],
    ['onSite', 'On site', `${plan.onSite.arrivedAt ?? '—'} to ${plan.onSite.leftAt ?? '—'}`],
    ['notes', 'Notes', plan.notes],
  ];
}

export function diffPlans(before: VisitPlan, after: VisitPlan): PlanDifference[] {
  const a = sections(before);
  const b = sections(after);
  return a.flatMap(([path, label, was], i) => (was === b[i][2] ? [] : [{ path, label, before: none(was), after: none(b[i][2]) }]));
}
