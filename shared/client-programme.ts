// A client's programme: the terms a carrier, administrator or adjusting firm sets for its
// captures. Saving never edits a version; it adds the next one, and a job keeps the version it
// was created under (a review keeps the one it was scored under), like the rubric.
import { LOSS_TYPES, type LossType } from './jobs';

// The rule kinds are a fixed list; their parameters are the manager's.
export const REQUIREMENT_KINDS = [
  'exterior_stations',
  'attic_captured',
  'detached_structures',
  'damage_photos',
  'max_station_spacing',
  'processing_within',
] as const;
export type RequirementKind = (typeof REQUIREMENT_KINDS)[number];

export type RequirementParams = {
  // At least `minStations` exterior stations for the listed loss types.
  exterior_stations: { lossTypes: LossType[]; minStations: number };
  // The attic captured whenever it can be reached, or a coverage gap saying why not; for the
  // listed loss types (empty: every loss).
  attic_captured: { lossTypes: LossType[] };
  // Every detached structure of at least `minAreaM2` (or of unrecorded size) in a model, or a reason.
  detached_structures: { minAreaM2: number };
  // At least `minPhotos` photos attached to each damage area.
  damage_photos: { minPhotos: number };
  // No room with fewer stations than this spacing needs; replaces the camera class's spacing.
  max_station_spacing: { maxSpacingM: number };
  // Processing confirmed within `hours` of leaving the site.
  processing_within: { hours: number };
};

export const REQUIREMENT_SEVERITIES = ['blocking', 'warning'] as const;
export type RequirementSeverity = (typeof REQUIREMENT_SEVERITIES)[number];

export type Requirement = {
  [K in RequirementKind]: { key: string; kind: K; params: RequirementParams[K]; severity: RequirementSeverity; message: string };
}[RequirementKind];

export const REQUIREMENT_KIND_LABELS: Record<RequirementKind, string> = {
  exterior_stations: 'Exterior stations for some losses',
  attic_captured: 'Attic captured or explained',
  detached_structures: 'Detached structures captured or explained',
  damage_photos: 'Photos per damage area',
  max_station_spacing: 'Maximum station spacing',
  processing_within: 'Processing confirmed soon after the visit',
};

export const SEVERITY_LABELS: Record<RequirementSeverity, string> = {
  blocking: 'Blocks submission',
  warning: 'Warning only',
};

// Bounds of each numeric parameter, shared by the form and the server's validation.
export const PARAM_BOUNDS = {
  minStations: { min: 1, max: 200 },
  minAreaM2: { min: 0, max: 5000 },
  minPhotos: { min: 1, max: 50 },
  maxSpacingM: { min: 0.5, max: 30 },
  hours: { min: 1, max: 720 },
} as const;

export const DELIVERY_RELEASES = ['automatic', 'manual'] as const;
export type DeliveryRelease = (typeof DELIVERY_RELEASES)[number];
export const DELIVERY_RELEASE_LABELS: Record<DeliveryRelease, string> = {
  automatic: 'Sent to the adjuster on acceptance',
  manual: 'Waits for a manager to release it',
};

export type ProgrammeTerms = {
  // Null: the newest rubric at the time of scoring.
  rubricVersion: number | null;
  // Hours from submission to the review decision.
  reviewHours: number;
  // Hours from a rework request to the technician's answers.
  reworkHours: number;
  deliveryRelease: DeliveryRelease;
  requirements: Requirement[];
};

export const HOURS_BOUNDS = { min: 1, max: 720 } as const;
export const MAX_REQUIREMENTS = 20;
export const REQUIREMENT_MESSAGE_MAX = 300;

export type ProgrammeView = ProgrammeTerms & { id: number; version: number; createdAt: string; createdBy: string | null };

export type ClientView = {
  id: number;
  name: string;
  deliveryEmail: string | null;
  notes: string;
  active: boolean;
  programme: ProgrammeView;
};

// The programme a job was created under, as the job page and the scoring screen read it.
export type JobProgramme = ProgrammeTerms & { clientId: number; clientName: string; version: number };

export type ClientInput = { name: string; deliveryEmail: string | null; notes: string };
export const CLIENT_NAME_MAX = 120;
export const CLIENT_NOTES_MAX = 2000;

// Terms a new client starts with: the firm's usual deadlines and no requirements of its own.
export function defaultProgrammeTerms(reviewHours = 24, reworkHours = 48): ProgrammeTerms {
  return { rubricVersion: null, reviewHours, reworkHours, deliveryRelease: 'automatic', requirements: [] };
}

// A new rule of a kind, with parameters a manager would start from.
export function newRequirement(kind: RequirementKind, key: string): Requirement {
  const base = { key, severity: 'warning' as const };
  switch (kind) {
    case 'exterior_stations':
      return {
        ...base,
        kind,
        params: { lossTypes: ['wind', 'hail'], minStations: 4 },
        message: 'Capture the exterior for wind and hail losses.',
      };
    case 'attic_captured':
      return { ...base, kind, params: { lossTypes: [] }, message: 'Capture the attic whenever it can be reached, or say why not.' };
    case 'detached_structures':
      return { ...base, kind, params: { minAreaM2: 10 }, message: 'Capture every detached structure of this size, or give a reason.' };
    case 'damage_photos':
      return { ...base, kind, params: { minPhotos: 2 }, message: 'Attach photos to every damage area.' };
    case 'max_station_spacing':
      return { ...base, kind, params: { maxSpacingM: 1.5 }, message: 'Keep stations close together indoors.' };
    case 'processing_within':
      return { ...base, kind, params: { hours: 24 }, message: 'Confirm processing within a day of the visit.' };
  }
}

export function isLossType(value: unknown): value is LossType {
  return typeof value === 'string' && (LOSS_TYPES as readonly string[]).includes(value);
}
