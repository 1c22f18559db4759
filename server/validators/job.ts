import { body, query } from 'express-validator';

import { CONTACT_FIELDS, CONTACT_MAX_LENGTH, PHONE_PATTERN } from '../../shared/contacts';
import { JOB_SORTS, LOSS_TYPES, PRIORITIES, PROPERTY_TYPES, UPDATABLE_JOB_FIELDS } from '../../shared/jobs';
import { SEARCH_MAX_LENGTH } from '../../shared/search';

const ISO_DATE = /^\d{4}-\d{2}-\d{2}$/;
const today = () => new Date().toISOString().slice(0, 10);

// The claim's contacts: each optional, text of a bounded length; the e-mail and phone checked.
const contactRules = [
  ...CONTACT_FIELDS.filter((f) => f !== 'adjusterEmail' && f !== 'policyholderPhone').map((field) =>
    body(field, `Text of at most ${CONTACT_MAX_LENGTH[field]} characters`)
      .optional({ values: 'null' })
      .isString()
      .isLength({ max: CONTACT_MAX_LENGTH[field] }),
  ),
  body('adjusterEmail', 'Enter an e-mail address like name@example.com')
    .optional({ values: 'falsy' })
    .isString()
    .trim()
    .isEmail()
    .isLength({ max: CONTACT_MAX_LENGTH.adjusterEmail }),
  body('policyholderPhone', 'Enter a phone number: digits, spaces, ( ) - . and an optional leading +')
    .optional({ values: 'falsy' })
    .isString()
    .trim()
    .matches(PHONE_PATTERN),
];

export const jobCreateRules = [
  body('claimReference', 'Use 3 to 40 letters, digits or dashes')
    .isString()
    .trim()
    .matches(/^[A-Za-z0-9-]{3,40}$/),
  body('street', 'Enter the street address').isString().trim().isLength({ min: 3, max: 160 }),
  body('city', 'Enter the city').isString().trim().isLength({ min: 2, max: 80 }),
  body('postcode', 'Enter the postcode').isString().trim().isLength({ min: 2, max: 16 }),
  body('propertyType', `Choose one of: ${PROPERTY_TYPES.join(', ')}`).isIn(PROPERTY_TYPES),
  body('lossType', `Choose one of: ${LOSS_TYPES.join(', ')}`).isIn(LOSS_TYPES),
  body('lossDate', 'Enter the loss date as YYYY-MM-DD, not in the future')
    .isString()
    .matches(ISO_DATE)
    .isISO8601({ strict: true })
    .custom((v: string) => v <= today()),
  body('siteVisitDate', 'Enter the site-visit date as YYYY-MM-DD, on or after the loss date')
    .optional({ values: 'null' })
    .isString()
    .matches(ISO_DATE)
    .isISO8601({ strict: true })
    // Compared only with a well-formed loss date: a bad loss date is reported on its own field.
    .custom((v: string, { req }) => typeof req.body.lossDate !== 'string' || !ISO_DATE.test(req.body.lossDate) || v >= req.body.lossDate),
  body('dueAt', 'Enter the delivery due date and time').isISO8601({ strict: true }),
  body('priority', `Choose one of: ${PRIORITIES.join(', ')}`).isIn(PRIORITIES),
  body('technicianId', 'Choose a technician').isInt({ min: 1 }).toInt(),
  ...contactRules,
];

export const jobUpdateRules = [
  body('technicianId', 'Choose a technician').optional().isInt({ min: 1 }).toInt(),
  body('dueAt', 'Enter the delivery due date and time').optional().isISO8601({ strict: true }),
  body('priority', `Choose one of: ${PRIORITIES.join(', ')}`)
    .optional()
    .isIn(PRIORITIES),
  body('siteVisitDate', 'Enter the site-visit date as YYYY-MM-DD')
    .optional({ values: 'null' })
    .isString()
    .matches(ISO_DATE)
    .isISO8601({ strict: true }),
  ...contactRules,
  body()
    .custom((v) => v && [...UPDATABLE_JOB_FIELDS].some((k) => v[k] !== undefined))
    .withMessage(`Send at least one of ${UPDATABLE_JOB_FIELDS.join(', ')}`),
];

export const jobListRules = [
  query('q', `Search text of at most ${SEARCH_MAX_LENGTH} characters`).optional().isString().isLength({ max: SEARCH_MAX_LENGTH }),
  query('sort', `Choose one of: ${JOB_SORTS.join(', ')}`)
    .optional()
    .isIn(JOB_SORTS),
  query('dir', 'asc or desc').optional().isIn(['asc', 'desc']),
  query('page', 'A page number from 1').optional().isInt({ min: 1, max: 10_000 }).toInt(),
  query('pageSize', 'From 5 to 100 rows').optional().isInt({ min: 5, max: 100 }).toInt(),
];
