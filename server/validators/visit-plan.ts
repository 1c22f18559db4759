// Shape, type, range and enum rules for every field of a visit plan and for the settings per
// camera class. Like the capture record, a half-made plan saves; a malformed one never does.
import { body, param } from 'express-validator';

import { CAMERA_CLASSES, HAZARDS, LEVEL_KINDS, SPLIT_REASONS, STRUCTURES } from '../../shared/capture-record';
import { PLAN_LIMITS as L, PLAN_STRUCTURE_KINDS } from '../../shared/visit-plan';
import { SETTINGS_LIMITS } from '../../shared/visit-settings';

const oneOf = (values: readonly string[]) => `Choose one of: ${values.join(', ')}`;
const text = (path: string, max: number) => body(path, `Text of at most ${max} characters`).isString().isLength({ max });
const key = (path: string) => body(path, 'Missing item key').isString().isLength({ min: 1, max: 40 });
const flag = (path: string) => body(path, 'Must be yes or no').isBoolean({ strict: true });
const optionalLength = (path: string) =>
  body(path, `A number from 0 to ${L.roomLengthM} m`).optional({ values: 'null' }).isFloat({ min: 0, max: L.roomLengthM }).toFloat();
const optionalTime = (path: string) => body(path, 'A date and time').optional({ values: 'null' }).isISO8601();
const uniqueKeys = (path: string) =>
  body(path, 'Each item only once').custom((items: { key: string }[]) => new Set(items.map((i) => i.key)).size === items.length);

export const visitPlanRules = [
  body('structures', `A list of at most ${L.structures} structures`).isArray({ max: L.structures }),
  key('structures.*.key'),
  body('structures.*.kind', oneOf(PLAN_STRUCTURE_KINDS)).isIn(PLAN_STRUCTURE_KINDS),
  text('structures.*.name', L.name),
  flag('structures.*.reachableInside'),
  flag('structures.*.inScope'),
  text('structures.*.scopeNote', L.note),
  uniqueKeys('structures'),

  body('cameraClass', oneOf(CAMERA_CLASSES)).optional({ values: 'null' }).isIn(CAMERA_CLASSES),
  body('conditions', 'The conditions on site').isObject(),
  flag('conditions.directSun'),
  flag('conditions.outdoorBlocked'),

  body('models', `A list of at most ${L.models} models`).isArray({ max: L.models }),
  key('models.*.key'),
  body('models.*.structureKeys', 'A list of structure keys').isArray({ max: L.structures }),
  body('models.*.structureKeys.*', 'Missing structure key').isString().isLength({ min: 1, max: 40 }),
  body('models.*.structure', oneOf(STRUCTURES)).isIn(STRUCTURES),
  text('models.*.structureNote', 200),
  body('models.*.splitReason', oneOf(SPLIT_REASONS)).optional({ values: 'null' }).isIn(SPLIT_REASONS),
  text('models.*.splitNote', L.note),
  uniqueKeys('models'),
  flag('modelsAccepted'),

  body('startLevel', oneOf(LEVEL_KINDS)).optional({ values: 'null' }).isIn(LEVEL_KINDS),
  body('units', 'Choose ft or m').isIn(['ft', 'm']),
  body('rooms', `A list of at most ${L.rooms} rooms`).isArray({ max: L.rooms }),
  key('rooms.*.key'),
  text('rooms.*.name', L.name),
  body('rooms.*.level', oneOf(LEVEL_KINDS)).isIn(LEVEL_KINDS),
  optionalLength('rooms.*.lengthM'),
  optionalLength('rooms.*.widthM'),
  uniqueKeys('rooms'),

  body('hazards', 'A list of hazards').isArray({ max: HAZARDS.length }),
  body('hazards.*', oneOf(HAZARDS)).isIn(HAZARDS),
  body('kitTicked', `A list of at most ${L.kitItems} kit items`).isArray({ max: L.kitItems }),
  body('kitTicked.*', `Text of at most ${L.kitItem} characters`).isString().isLength({ max: L.kitItem }),
  body('onSite', 'Arrival and leaving times').isObject(),
  optionalTime('onSite.arrivedAt'),
  optionalTime('onSite.leftAt'),
  text('notes', L.note),
];

export const cameraClassParam = param('cameraClass', oneOf(CAMERA_CLASSES)).isIn(CAMERA_CLASSES);

export const cameraClassSettingsRules = [
  body('kitItems', `A list of 1 to ${L.kitItems} items`).isArray({ min: 1, max: L.kitItems }),
  body('kitItems.*', `Each item: text of 1 to ${L.kitItem} characters`).isString().trim().isLength({ min: 1, max: L.kitItem }),
  body('kitItems', 'Each item only once').custom((items: string[]) => new Set(items).size === items.length),
  body('minutesPerStation', `A number from 0.1 to ${SETTINGS_LIMITS.minutesPerStation}, or none`)
    .optional({ values: 'null' })
    .isFloat({ min: 0.1, max: SETTINGS_LIMITS.minutesPerStation })
    .toFloat(),
  body('setupMinutes', `A whole number from 0 to ${SETTINGS_LIMITS.setupMinutes}`)
    .isInt({ min: 0, max: SETTINGS_LIMITS.setupMinutes })
    .toInt(),
];
