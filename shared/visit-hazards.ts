// The hazards to think of for a loss and a property, each with the usual caution. Sightline
// reminds; it does not judge what is safe: every caution defers to local codes and licensed
// practice.
import type { Hazard } from './capture-record';
import type { LossType } from './jobs';
import type { PlannedStructure } from './visit-plan';

export const DEFER = 'Follow local codes and licensed practice.';

export const HAZARD_CAUTIONS: Record<Hazard, string> = {
  standing_water:
    'Standing water can hide holes and live current. Do not walk into it until power to the area is confirmed off by someone qualified.',
  live_wiring: 'Treat exposed or wet wiring as live. Do not touch it or set the tripod near it; leave it to a licensed electrician.',
  unsafe_attic_decking: 'Step only on joists or boarded decking; insulation hides gaps. Use a light and keep a hand free.',
  mould: 'Wear a respirator and gloves where mould is visible or smelt; keep the visit short in closed rooms.',
  roof_access: 'Do not go on a wet, steep or damaged roof. Capture from the ground or a ladder at the eaves if that is safe.',
  fire_structure: 'Fire weakens floors, stairs and ceilings. Do not enter where the structure has not been cleared as safe.',
  soot: 'Soot and ash irritate lungs and skin: wear a respirator, gloves and covers, and keep the camera lens covered between stations.',
  crawl_space_entry:
    'Check for standing water, wiring, pests and clearance before entering; tell someone you are going in and keep a light.',
  ladders: 'Set a ladder on firm ground at a safe angle, have it held or tied off, and keep three points of contact.',
};

// Suggested for a loss type; the technician ticks what actually applies.
const BY_LOSS: Record<LossType, Hazard[]> = {
  water: ['standing_water', 'live_wiring', 'mould'],
  fire: ['fire_structure', 'soot', 'live_wiring'],
  smoke: ['soot'],
  wind: ['roof_access', 'ladders'],
  hail: ['roof_access', 'ladders'],
  other: [],
};

export function suggestedHazards(lossType: LossType, structures: Pick<PlannedStructure, 'kind' | 'inScope'>[]): Hazard[] {
  const found = new Set<Hazard>(BY_LOSS[lossType]);
  const scoped = structures.filter((s) => s.inScope);
  if (scoped.some((s) => s.kind === 'attic')) found.add('unsafe_attic_decking');
  if (scoped.some((s) => s.kind === 'crawl_space')) found.add('crawl_space_entry');
  return [...found];
}
