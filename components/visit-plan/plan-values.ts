// The plan as the screens hold it: the stored plan, except room sizes are the text typed (in
// the plan's unit), so "12." survives a keystroke. toPlan turns them back into metres.
import { lengthProblem } from '@/shared/capture-limits';
import type { LevelKind } from '@/shared/capture-record';
import { fromMetres, roundTo, toMetres } from '@/shared/units';
import type { PlannedRoom, VisitPlan } from '@/shared/visit-plan';

export type RoomValues = Omit<PlannedRoom, 'lengthM' | 'widthM'> & { length: string; width: string };
export type PlanValues = Omit<VisitPlan, 'rooms'> & { rooms: RoomValues[] };

const typed = (metres: number | null, plan: VisitPlan) => (metres === null ? '' : String(roundTo(fromMetres(metres, plan.units), 2)));

export function toPlanValues(plan: VisitPlan): PlanValues {
  return {
    ...plan,
    rooms: plan.rooms.map(({ lengthM, widthM, ...room }) => ({ ...room, length: typed(lengthM, plan), width: typed(widthM, plan) })),
  };
}

export type PlanConversion = { plan: VisitPlan; errors: Record<string, string> };

export function toPlan(values: PlanValues): PlanConversion {
  const errors: Record<string, string> = {};
  const size = (field: string, raw: string, limit: 'roomLengthM' | 'roomWidthM'): number | null => {
    const trimmed = raw.trim().replace(',', '.');
    if (trimmed === '') return null;
    const n = Number(trimmed);
    const problem = Number.isFinite(n) && n >= 0 ? lengthProblem(n, values.units, limit) : 'Enter a number, 0 or more';
    if (problem) {
      errors[field] = problem;
      return null;
    }
    return toMetres(n, values.units);
  };
  const rooms = values.rooms.map(({ length, width, ...room }, i) => ({
    ...room,
    lengthM: size(`rooms.${i}.length`, length, 'roomLengthM'),
    widthM: size(`rooms.${i}.width`, width, 'roomWidthM'),
  }));
  return { plan: { ...values, rooms }, errors };
}

export function newPlanKey(prefix: string) {
  return `${prefix}${Date.now().toString(36)}${Math.random().toString(36).slice(2, 6)}`;
}

export function emptyPlanRoom(level: LevelKind): RoomValues {
  return { key: newPlanKey('p'), name: '', level, length: '', width: '' };
}
