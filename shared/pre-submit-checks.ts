// Checks run before a capture record is submitted. The client shows them as the technician
// types; the server runs the same function at submit and refuses when facts are missing.
// Missing facts block submission; warnings do not.
import {
  CAMERA_CLASS_LABELS,
  type CaptureRecord,
  LEVEL_LABELS,
  type LevelKind,
  REFLECTIVE_LABELS,
  roomAreaM2,
  roomStationSum,
} from './capture-record';
import type { Requirement } from './client-programme';
import { evaluateRequirements, type RequirementFacts, requirementFinding, spacingOverrideM } from './client-requirements';
import { planWarnings } from './plan-record';
import { expectedStations, MAX_STATION_SPACING_M } from './station-spacing';
import { AREA_LABEL, fromMetres, fromSquareMetres, roundTo } from './units';
import type { VisitPlan } from './visit-plan';

export type Finding = { field: string; message: string };
export type CheckResult = { missing: Finding[]; warnings: Finding[] };

// Facts from outside the record: when the last revision was submitted (a processing
// confirmation must be newer), and the station count per level in the attached station file.
export type CheckContext = {
  previousSubmittedAt?: string | null;
  stationFileLevels?: { level: LevelKind; stations: number }[] | null;
  // The visit plan, when one was made: what it expected and the record lacks is a warning.
  plan?: VisitPlan | null;
  // The client's programme under which the job was created: its failing rules block or warn.
  client?: { name: string; requirements: Requirement[]; facts: RequirementFacts } | null;
};

// A processing confirmation counts only for the revision it was made for: one made before
// the last submission belongs to that earlier revision.
export function processingConfirmedFor(processing: CaptureRecord['processing'], previousSubmittedAt?: string | null): boolean {
  if (!processing.confirmed) return false;
  if (!previousSubmittedAt) return true;
  return Boolean(processing.confirmedAt) && processing.confirmedAt! > new Date(previousSubmittedAt).toISOString();
}

export function checkCaptureRecord(record: CaptureRecord, context: CheckContext = {}): CheckResult {
  const missing: Finding[] = [];
  const warnings: Finding[] = [];
  const need = (field: string, message: string) => missing.push({ field, message });
  const warn = (field: string, message: string) => warnings.push({ field, message });

  if (!record.cameraClass) need('cameraClass', 'Choose the camera class used.');
  if (record.levels.length === 0) need('levels', 'List the levels captured.');
  if (record.rooms.length === 0) need('rooms', 'Add at least one room.');
  if (!record.glazingFlagged) need('glazingFlagged', 'Say whether glazing was flagged.');
  if (record.models.length === 0) need('models', 'Add the delivered model (at least one).');
  if (!record.processing.confirmed) need('processing.confirmed', 'Confirm that processing started on the capture platform.');
  else if (!processingConfirmedFor(record.processing, context.previousSubmittedAt))
    need(
      'processing.confirmed',
      'Confirm processing again for this revision: the confirmation on file is from before the last submission.',
    );

  if (context.stationFileLevels) {
    const counted = new Map(record.levels.map((l) => [l.level, l.stations]));
    for (const { level, stations } of context.stationFileLevels) {
      const inRecord = counted.get(level);
      if (inRecord !== stations)
        warn(
          'levels',
          `The station file has ${stations} station${stations === 1 ? '' : 's'} on the ${LEVEL_LABELS[level].toLowerCase()}; the record says ${inRecord ?? 'none'}.`,
        );
    }
  }

  const sum = roomStationSum(record);
  if (record.totalStations === null) {
    need('totalStations', 'Enter the total station count.');
  } else if (record.totalStations !== sum) {
    need('totalStations', `Total stations (${record.totalStations}) must equal stations in rooms plus exterior (${sum}).`);
  }

  record.rooms.forEach((room, i) => {
    if (!room.name.trim()) need(`rooms.${i}.name`, 'Name the room.');
  });
  record.models.forEach((model, i) => {
    if (!model.platformReference.trim()) need(`models.${i}.platformReference`, "Enter the model's reference on the capture platform.");
    if (model.structure !== 'main_dwelling' && !model.splitReason)
      need(`models.${i}.splitReason`, 'Give the reason for splitting this model out.');
  });
  record.damageAreas.forEach((area, i) => {
    if (!area.description.trim()) need(`damageAreas.${i}.description`, 'Describe the damage.');
  });
  record.gaps.forEach((gap, i) => {
    if (!gap.location.trim()) need(`gaps.${i}.location`, 'Say where the gap is.');
  });

  // A client's spacing rule replaces the camera class's spacing: its own finding covers the rooms.
  const override = context.client ? spacingOverrideM(context.client.requirements) : null;
  const spacing = record.cameraClass && override === null ? MAX_STATION_SPACING_M[record.cameraClass] : null;
  record.rooms.forEach((room, i) => {
    const label = room.name.trim() || `Room ${i + 1}`;
    const area = roomAreaM2(room);
    if (spacing !== null && area !== null && record.cameraClass) {
      const expected = expectedStations(area, spacing);
      if (room.stations < expected) {
        warn(
          `rooms.${i}.stations`,
          `${label}: ${room.stations} station${room.stations === 1 ? '' : 's'} for about ` +
            `${roundTo(fromSquareMetres(area, record.units), 1)} ${AREA_LABEL[record.units]}; ` +
            `about ${expected} expected at ${roundTo(fromMetres(spacing, record.units), 1)} ${record.units} spacing ` +
            `for a ${CAMERA_CLASS_LABELS[record.cameraClass].toLowerCase()} (common practice).`,
        );
      }
    }
    if (!room.doorwayStation)
      warn(`rooms.${i}.doorwayStation`, `${label}: no station in the doorway, so registration to the next room is weaker.`);
    room.reflective.forEach((surface, j) => {
      if (surface.found > surface.flagged) {
        warn(
          `rooms.${i}.reflective.${j}`,
          `${label}: ${surface.found - surface.flagged} ${REFLECTIVE_LABELS[surface.kind].toLowerCase()} surface(s) found but not flagged.`,
        );
      }
    });
  });

  for (const level of record.levels) {
    const inRooms =
      level.level === 'exterior'
        ? record.exteriorStations
        : record.rooms.filter((r) => r.level === level.level).reduce((s, r) => s + r.stations, 0);
    if (level.stations !== inRooms) {
      warn(
        `levels.${level.level}`,
        `${LEVEL_LABELS[level.level]}: ${level.stations} stations listed for the level, ${inRooms} in its rooms.`,
      );
    }
  }

  record.gaps.forEach((gap, i) => {
    if (!gap.resolved) warn(`gaps.${i}.resolved`, `Coverage gap at ${gap.location.trim() || `gap ${i + 1}`} is not resolved.`);
  });

  record.damageAreas.forEach((area, i) => {
    const label = area.description.trim() || `Damage area ${i + 1}`;
    if (area.stationNumbers.length === 0) {
      warn(`damageAreas.${i}.stationNumbers`, `${label}: no station views it clearly.`);
    } else if (record.totalStations !== null && area.stationNumbers.some((n) => n > record.totalStations!)) {
      warn(`damageAreas.${i}.stationNumbers`, `${label}: a station number is higher than the total station count.`);
    }
  });

  record.detachedStructures.forEach((structure, i) => {
    const hasModel = structure.modelKey !== null && record.models.some((m) => m.key === structure.modelKey);
    if (!hasModel && !structure.noModelReason.trim()) {
      warn(`detachedStructures.${i}`, `${structure.name.trim() || 'Detached structure'}: no model and no reason given.`);
    }
  });

  warnings.push(...planWarnings(record, context.plan ?? null));
  if (context.client) {
    const { name, requirements, facts } = context.client;
    for (const result of evaluateRequirements(requirements, record, { ...facts, plan: facts.plan ?? context.plan })) {
      if (result.status !== 'fail') continue;
      (result.severity === 'blocking' ? missing : warnings).push(requirementFinding(name, result));
    }
  }
  return { missing, warnings };
}
