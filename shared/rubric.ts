// A rubric: versioned criteria with weights, a scale, a critical mark and a condition that
// decides whether the criterion applies to a capture record.
import type { CaptureRecord } from './capture-record';

export const APPLIES_WHEN = ['always', 'reflective_found', 'multi_structure', 'damage_recorded', 'gaps_recorded'] as const;
export type AppliesWhen = (typeof APPLIES_WHEN)[number];
export const APPLIES_WHEN_LABELS: Record<AppliesWhen, string> = {
  always: 'Always',
  reflective_found: 'Only when reflective surfaces were found',
  multi_structure: 'Only for properties with more than one structure',
  damage_recorded: 'Only when damage areas are recorded',
  gaps_recorded: 'Only when coverage gaps are noted',
};

export type Scale = { kind: 'levels'; levels: [string, string, string, string, string] } | { kind: 'pass_fail' };

export type Criterion = {
  key: string;
  title: string;
  guidance: string;
  weight: number;
  scale: Scale;
  critical: boolean;
  appliesWhen: AppliesWhen;
  stockReasons: string[];
};

export type RubricDefinition = { passMark: number; criteria: Criterion[] };

export type Rubric = RubricDefinition & { id: number; version: number; createdAt: string };

export function scaleMax(scale: Scale): number {
  return scale.kind === 'levels' ? 4 : 1;
}

export function criterionApplies(criterion: Pick<Criterion, 'appliesWhen'>, record: CaptureRecord): boolean {
  switch (criterion.appliesWhen) {
    case 'always':
      return true;
    case 'reflective_found':
      return record.rooms.some((room) => room.reflective.some((s) => s.found > 0));
    case 'multi_structure':
      return record.models.length > 1 || record.detachedStructures.length > 0;
    case 'damage_recorded':
      return record.damageAreas.length > 0;
    case 'gaps_recorded':
      return record.gaps.length > 0;
  }
}
