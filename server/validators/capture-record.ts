// Shape, type, range and enum rules for every field of a capture record. Required facts and
// cross-field rules (station totals, split reasons, …) are checked at submit by the shared
// pre-submit checks, so that autosave never loses a half-typed record.
import { body } from 'express-validator';

import { RECORD_LIMITS as L } from '../../shared/capture-limits';
import {
  CAMERA_CLASSES,
  GAP_CAUSES,
  GLAZING_FLAGGED,
  HAZARDS,
  LEVEL_KINDS,
  REFLECTIVE_KINDS,
  SPLIT_REASONS,
  STRUCTURES,
} from '../../shared/capture-record';
import { LOSS_TYPES } from '../../shared/jobs';

const oneOf = (values: readonly string[]) => `Choose one of: ${values.join(', ')}`;
const text = (path: string, max: number) => body(path, `Text of at most ${max} characters`).isString().isLength({ max });
const key = (path: string) => body(path, 'Missing item key').isString().isLength({ min: 1, max: 40 });
const count = (path: string, max: number) => body(path, `A whole number from 0 to ${max}`).isInt({ min: 0, max }).toInt();
const flag = (path: string) => body(path, 'Must be yes or no').isBoolean({ strict: true });
const optionalMeasure = (path: string, max: number) =>
  body(path, `A number from 0 to ${max}`).optional({ values: 'null' }).isFloat({ min: 0, max }).toFloat();

export const captureRecordRules = [
  body('cameraClass', oneOf(CAMERA_CLASSES)).optional({ values: 'null' }).isIn(CAMERA_CLASSES),
  body('units', 'Choose ft or m').isIn(['ft', 'm']),

  body('levels', `A list of at most ${L.levels} levels`).isArray({ max: L.levels }),
  body('levels.*.level', oneOf(LEVEL_KINDS)).isIn(LEVEL_KINDS),
  count('levels.*.stations', L.levelStations),
  body('levels', 'Each level only once').custom(
    (levels: { level: string }[]) => new Set(levels.map((l) => l.level)).size === levels.length,
  ),

  body('rooms', `A list of at most ${L.rooms} rooms`).isArray({ max: L.rooms }),
  key('rooms.*.key'),
  text('rooms.*.name', L.roomName),
  body('rooms.*.level', oneOf(LEVEL_KINDS)).isIn(LEVEL_KINDS),
  optionalMeasure('rooms.*.lengthM', L.roomLengthM),
  optionalMeasure('rooms.*.widthM', L.roomWidthM),
  optionalMeasure('rooms.*.areaM2', L.roomAreaM2),
  count('rooms.*.stations', L.roomStations),
  flag('rooms.*.doorwayStation'),
  body('rooms.*.reflective', 'A list of reflective surface counts').isArray({ max: REFLECTIVE_KINDS.length }),
  body('rooms.*.reflective.*.kind', oneOf(REFLECTIVE_KINDS)).isIn(REFLECTIVE_KINDS),
  count('rooms.*.reflective.*.found', L.reflectiveCount),
  count('rooms.*.reflective.*.flagged', L.reflectiveCount),
  body('rooms.*.reflective.*', 'Flagged cannot be more than found').custom(
    (s: { found: number; flagged: number }) => Number(s.flagged) <= Number(s.found),
  ),

  count('exteriorStations', L.exteriorStations),
  body('totalStations', `A whole number from 0 to ${L.totalStations}`)
    .optional({ values: 'null' })
    .isInt({ min: 0, max: L.totalStations })
    .toInt(),
  body('glazingFlagged', oneOf(GLAZING_FLAGGED)).optional({ values: 'null' }).isIn(GLAZING_FLAGGED),

  body('models', 'A list of at most 20 models').isArray({ max: 20 }),
  key('models.*.key'),
  body('models.*.structure', oneOf(STRUCTURES)).isIn(STRUCTURES),
  text('models.*.structureNote', 200),
  body('models.*.splitReason', oneOf(SPLIT_REASONS)).optional({ values: 'null' }).isIn(SPLIT_REASONS),
  text('models.*.splitNote', 500),
  text('models.*.platformReference', 120),

  body('detachedStructures', 'A list of at most 20 structures').isArray({ max: 20 }),
  key('detachedStructures.*.key'),
  text('detachedStructures.*.name', 80),
  body('detachedStructures.*.structure', oneOf(STRUCTURES)).isIn(STRUCTURES),
  body('detachedStructures.*.modelKey', 'Missing model key').optional({ values: 'null' }).isString().isLength({ max: 40 }),
  text('detachedStructures.*.noModelReason', 500),
  optionalMeasure('detachedStructures.*.areaM2', 5000),

  body('gaps', 'A list of at most 100 gaps').isArray({ max: 100 }),
  key('gaps.*.key'),
  text('gaps.*.location', 120),
  body('gaps.*.cause', oneOf(GAP_CAUSES)).isIn(GAP_CAUSES),
  flag('gaps.*.resolved'),
  text('gaps.*.note', 500),

  body('damageAreas', 'A list of at most 100 damage areas').isArray({ max: 100 }),
  key('damageAreas.*.key'),
  body('damageAreas.*.roomKey', 'Choose a room').isString().isLength({ max: 40 }),
  text('damageAreas.*.description', 500),
  body('damageAreas.*.lossType', oneOf(LOSS_TYPES)).isIn(LOSS_TYPES),
  body('damageAreas.*.stationNumbers', 'A list of station numbers').isArray({ max: 200 }),
  body('damageAreas.*.stationNumbers.*', 'Station numbers are whole numbers from 1 to 5000').isInt({ min: 1, max: 5000 }).toInt(),
  body('damageAreas.*.photoFileIds', 'A list of photo ids').isArray({ max: 50 }),
  body('damageAreas.*.photoFileIds.*', 'Photo ids are whole numbers').isInt({ min: 1 }).toInt(),

  count('panoramas.count', L.panoramas),
  body('panoramas.roomKeys', 'A list of room keys').isArray({ max: 200 }),
  body('panoramas.roomKeys.*', 'Missing room key').isString().isLength({ max: 40 }),

  flag('processing.confirmed'),
  body('processing.confirmedAt', 'A date and time').optional({ values: 'null' }).isISO8601(),

  body('safety.hazards', 'A list of hazards').isArray({ max: HAZARDS.length }),
  body('safety.hazards.*', oneOf(HAZARDS)).isIn(HAZARDS),
  text('safety.note', L.safetyNote),
  text('notes', L.notes),
];
