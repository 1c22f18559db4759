// Reads a programme as sent by the form: every field's type and range checked, each problem
// named by its dotted field path, and nothing but the programme's own fields kept. The server
// refuses a request with any problem; the form shows the same messages beside the fields.
import {
  DELIVERY_RELEASES,
  type DeliveryRelease,
  HOURS_BOUNDS,
  isLossType,
  MAX_REQUIREMENTS,
  PARAM_BOUNDS,
  type ProgrammeTerms,
  type Requirement,
  REQUIREMENT_KINDS,
  REQUIREMENT_MESSAGE_MAX,
  REQUIREMENT_SEVERITIES,
  type RequirementKind,
  type RequirementSeverity,
} from './client-programme';
import type { LossType } from './jobs';

type Problems = Record<string, string>;
type Bound = { min: number; max: number };

const isObject = (v: unknown): v is Record<string, unknown> => v !== null && typeof v === 'object' && !Array.isArray(v);
const oneOf = (values: readonly string[]) => `Choose one of: ${values.join(', ')}`;

function numberAt(problems: Problems, field: string, value: unknown, bound: Bound, whole: boolean): number {
  const ok = typeof value === 'number' && Number.isFinite(value) && value >= bound.min && value <= bound.max;
  if (!ok || (whole && !Number.isInteger(value))) {
    problems[field] = `${whole ? 'A whole number' : 'A number'} from ${bound.min} to ${bound.max}`;
    return bound.min;
  }
  return value;
}

function lossTypesAt(problems: Problems, field: string, value: unknown, atLeastOne: boolean): LossType[] {
  if (!Array.isArray(value) || value.some((v) => !isLossType(v)) || (atLeastOne && value.length === 0)) {
    problems[field] = `A list of loss types${atLeastOne ? ', at least one' : ''}, each one of: water, fire, smoke, wind, hail, other`;
    return [];
  }
  return [...new Set(value as LossType[])];
}

function paramsAt(problems: Problems, at: string, kind: RequirementKind, raw: unknown): Requirement['params'] | null {
  if (!isObject(raw)) {
    problems[`${at}.params`] = 'The rule needs its parameters';
    return null;
  }
  const n = (name: keyof typeof PARAM_BOUNDS, whole: boolean) =>
    numberAt(problems, `${at}.params.${name}`, raw[name], PARAM_BOUNDS[name], whole);
  switch (kind) {
    case 'exterior_stations':
      return { lossTypes: lossTypesAt(problems, `${at}.params.lossTypes`, raw.lossTypes, true), minStations: n('minStations', true) };
    case 'attic_captured':
      return { lossTypes: lossTypesAt(problems, `${at}.params.lossTypes`, raw.lossTypes ?? [], false) };
    case 'detached_structures':
      return { minAreaM2: n('minAreaM2', false) };
    case 'damage_photos':
      return { minPhotos: n('minPhotos', true) };
    case 'max_station_spacing':
      return { maxSpacingM: n('maxSpacingM', false) };
    case 'processing_within':
      return { hours: n('hours', true) };
  }
}

function requirementAt(problems: Problems, at: string, raw: unknown, seen: Set<string>): Requirement | null {
  if (!isObject(raw)) {
    problems[at] = 'Each requirement is an object with a kind, parameters, severity and message';
    return null;
  }
  const key = raw.key;
  if (typeof key !== 'string' || !/^[A-Za-z0-9_-]{1,40}$/.test(key)) problems[`${at}.key`] = 'A key of 1 to 40 letters, digits, - or _';
  else if (seen.has(key)) problems[`${at}.key`] = 'Each requirement needs its own key';
  else seen.add(key);
  const kind = raw.kind;
  if (typeof kind !== 'string' || !(REQUIREMENT_KINDS as readonly string[]).includes(kind)) {
    problems[`${at}.kind`] = oneOf(REQUIREMENT_KINDS);
    return null;
  }
  if (typeof raw.severity !== 'string' || !(REQUIREMENT_SEVERITIES as readonly string[]).includes(raw.severity))
    problems[`${at}.severity`] = oneOf(REQUIREMENT_SEVERITIES);
  const message = typeof raw.message === 'string' ? raw.message.trim() : '';
  if (typeof raw.message !== 'string' || !message || message.length > REQUIREMENT_MESSAGE_MAX)
    problems[`${at}.message`] = `A message for the technician, 1 to ${REQUIREMENT_MESSAGE_MAX} characters`;
  const params = paramsAt(problems, at, kind as RequirementKind, raw.params);
  return { key: String(key), kind, params, severity: raw.severity as RequirementSeverity, message } as Requirement;
}

export function readProgramme(body: unknown, rubricVersions: number[]): { terms: ProgrammeTerms; problems: Problems } {
  const problems: Problems = {};
  const raw = isObject(body) ? body : {};
  const rubricVersion = raw.rubricVersion ?? null;
  if (rubricVersion !== null && (typeof rubricVersion !== 'number' || !rubricVersions.includes(rubricVersion)))
    problems.rubricVersion = `Choose a saved rubric version (${rubricVersions.join(', ') || 'none yet'}) or none for the newest`;
  const reviewHours = numberAt(problems, 'reviewHours', raw.reviewHours, HOURS_BOUNDS, true);
  const reworkHours = numberAt(problems, 'reworkHours', raw.reworkHours, HOURS_BOUNDS, true);
  const deliveryRelease = raw.deliveryRelease;
  if (typeof deliveryRelease !== 'string' || !(DELIVERY_RELEASES as readonly string[]).includes(deliveryRelease))
    problems.deliveryRelease = oneOf(DELIVERY_RELEASES);
  const requirements: Requirement[] = [];
  if (!Array.isArray(raw.requirements) || raw.requirements.length > MAX_REQUIREMENTS) {
    problems.requirements = `A list of at most ${MAX_REQUIREMENTS} requirements`;
  } else {
    const seen = new Set<string>();
    raw.requirements.forEach((item, i) => {
      const rule = requirementAt(problems, `requirements.${i}`, item, seen);
      if (rule) requirements.push(rule);
    });
  }
  return {
    terms: {
      rubricVersion: rubricVersion as number | null,
      reviewHours,
      reworkHours,
      deliveryRelease: deliveryRelease as DeliveryRelease,
      requirements,
    },
    problems,
  };
}
