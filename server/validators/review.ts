import { body, query } from 'express-validator';

import { CAMERA_CLASSES } from '../../shared/capture-record';
import { LOSS_TYPES, PRIORITIES } from '../../shared/jobs';
import { DECISIONS, QUEUE_SORTS, QUEUE_STATUSES } from '../../shared/review';
import { rubricProblems } from '../../shared/review-rules';
import { APPLIES_WHEN, type Criterion } from '../../shared/rubric';
import { SEARCH_MAX_LENGTH } from '../../shared/search';

const oneOf = (values: readonly string[]) => `Choose one of: ${values.join(', ')}`;

export const queueQueryRules = [
  query('page', 'A page number from 1').optional().isInt({ min: 1, max: 10_000 }).toInt(),
  query('pageSize', 'From 5 to 100 rows').optional().isInt({ min: 5, max: 100 }).toInt(),
  query('sort', oneOf(QUEUE_SORTS)).optional().isIn(QUEUE_SORTS),
  query('dir', 'asc or desc').optional().isIn(['asc', 'desc']),
  query('status', oneOf(QUEUE_STATUSES))
    .optional()
    .isString()
    .custom((v: string) => v.split(',').every((s) => (QUEUE_STATUSES as string[]).includes(s))),
  query('technicianId', 'Must be a user id').optional().isInt({ min: 1 }).toInt(),
  query('lossType', oneOf(LOSS_TYPES)).optional().isIn(LOSS_TYPES),
  query('priority', oneOf(PRIORITIES)).optional().isIn(PRIORITIES),
  query('cameraClass', oneOf(CAMERA_CLASSES)).optional().isIn(CAMERA_CLASSES),
  query('submission', 'first or resubmission').optional().isIn(['first', 'resubmission']),
  query('claimedByMe', 'true or false').optional().isBoolean(),
  query('q', `Search text of at most ${SEARCH_MAX_LENGTH} characters`).optional().isString().isLength({ max: SEARCH_MAX_LENGTH }),
];

export const reviewRules = [
  body('decision', oneOf(DECISIONS)).isIn(DECISIONS),
  body('scores', 'A list of criterion scores').isArray({ min: 1, max: 50 }),
  body('scores.*.key', 'Missing criterion key').isString().isLength({ min: 1, max: 40 }),
  body('scores.*.score', 'A whole number from 0 to 4, or null when not applicable')
    .optional({ values: 'null' })
    .isInt({ min: 0, max: 4 })
    .toInt(),
  body('scores.*.stockReason', 'Text of at most 120 characters').optional({ values: 'null' }).isString().isLength({ max: 120 }),
  body('scores.*.comment', 'Text of at most 2000 characters').isString().isLength({ max: 2000 }),
  body('note', 'Text of at most 2000 characters').optional({ values: 'null' }).isString().isLength({ max: 2000 }),
];

// A draft may be incomplete: any score may still be missing, and no decision chosen yet.
export const reviewDraftRules = [
  body('decision', oneOf(DECISIONS)).optional({ values: 'null' }).isIn(DECISIONS),
  body('scores', 'A list of criterion scores').isArray({ max: 50 }),
  body('scores.*.key', 'Missing criterion key').isString().isLength({ min: 1, max: 40 }),
  body('scores.*.score', 'A whole number from 0 to 4, or null').optional({ values: 'null' }).isInt({ min: 0, max: 4 }).toInt(),
  body('scores.*.stockReason', 'Text of at most 120 characters').optional({ values: 'null' }).isString().isLength({ max: 120 }),
  body('scores.*.comment', 'Text of at most 2000 characters').isString().isLength({ max: 2000 }),
  body('note', 'Text of at most 2000 characters').optional({ values: 'null' }).isString().isLength({ max: 2000 }),
];

export const reassignRules = [
  body('toReviewerId', 'Choose a reviewer').isInt({ min: 1 }).toInt(),
  body('jobIds', 'A list of job ids').optional().isArray({ min: 1, max: 200 }),
  body('jobIds.*', 'Job ids are whole numbers').isInt({ min: 1 }).toInt(),
  body('fromReviewerId', 'Choose the reviewer whose claims move').optional().isInt({ min: 1 }).toInt(),
  body()
    .custom((v) => v && (Array.isArray(v.jobIds) || v.fromReviewerId !== undefined))
    .withMessage('Send jobIds or fromReviewerId'),
];

const LEVEL_TEXT = 'Describe each of the five levels (0 to 4)';
export const rubricRules = [
  body('passMark', 'A pass mark from 0 to 100').isFloat({ min: 0, max: 100 }).toFloat(),
  body('criteria', 'From 1 to 30 criteria').isArray({ min: 1, max: 30 }),
  body('criteria.*.key', 'Lower-case letters, digits and underscores, up to 40')
    .isString()
    .matches(/^[a-z][a-z0-9_]{0,39}$/),
  body('criteria.*.title', 'A title of 2 to 120 characters').isString().trim().isLength({ min: 2, max: 120 }),
  body('criteria.*.guidance', 'At most 1000 characters').isString().isLength({ max: 1000 }),
  body('criteria.*.weight', 'A whole number from 1 to 100').isInt({ min: 1, max: 100 }).toInt(),
  body('criteria.*.critical', 'Must be true or false').isBoolean({ strict: true }),
  body('criteria.*.appliesWhen', oneOf(APPLIES_WHEN)).isIn(APPLIES_WHEN),
  body('criteria.*.scale.kind', 'levels or pass_fail').isIn(['levels', 'pass_fail']),
  body('criteria.*.scale.levels', LEVEL_TEXT).optional().isArray({ min: 5, max: 5 }),
  body('criteria.*.scale.levels.*', LEVEL_TEXT).isString().trim().isLength({ min: 1, max: 120 }),
  body('criteria.*.scale', LEVEL_TEXT).custom(
    (s: { kind: string; levels?: unknown[] }) => s.kind !== 'levels' || (Array.isArray(s.levels) && s.levels.length === 5),
  ),
  body('criteria.*.stockReasons', 'A list of at most 12 reasons').isArray({ max: 12 }),
  body('criteria.*.stockReasons.*', 'Reasons of 2 to 120 characters').isString().trim().isLength({ min: 2, max: 120 }),
  body('criteria').custom((criteria: Criterion[]) => {
    const problem = rubricProblems({ criteria }).criteria;
    if (problem) throw new Error(problem);
    return true;
  }),
];
