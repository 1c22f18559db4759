import { type NextFunction, type Request, type Response, Router } from 'express';
import { body, param, query } from 'express-validator';
import multer from 'multer';

import type { CaptureRecord } from '../../shared/capture-record';
import { CONTACT_FIELDS } from '../../shared/contacts';
import { CAPTION_MAX_LENGTH, fileTooLargeMessage, UPLOAD_KINDS, type UploadKind } from '../../shared/files';
import { JOB_STATUSES, type JobSort, type JobStatus, pickContacts, pickJobInput } from '../../shared/jobs';
import { config } from '../config';
import { HttpError, invalid } from '../errors';
import { requireBaseVersion } from '../middleware/base-version';
import { requireRole } from '../middleware/require-auth';
import { validate } from '../middleware/validate';
import { getRevision, saveDraft, submitRecord } from '../services/capture-record-service';
import { captionFile, detachFile, uploadFile } from '../services/files-service';
import { createJob, getJobDetail, listJobs, reassignJobs, updateJob } from '../services/jobs-service';
import { stationAnalysisFor } from '../services/station-service';
import { captureRecordRules } from '../validators/capture-record';
import { jobCreateRules, jobListRules, jobUpdateRules } from '../validators/job';

export const jobsRouter = Router();

const jobId = param('id', 'Must be a job id').isInt({ min: 1 }).toInt();
const anyJobReader = requireRole('technician', 'reviewer', 'manager', 'admin');
const jobManagers = requireRole('manager', 'admin');
const technicianOnly = requireRole('technician');

jobsRouter.get(
  '/',
  anyJobReader,
  validate(
    query('status', `Choose from: ${JOB_STATUSES.join(', ')}`)
      .optional()
      .isString()
      .custom((v: string) => v.split(',').every((s) => (JOB_STATUSES as readonly string[]).includes(s))),
    query('technicianId', 'Must be a user id').optional().isInt({ min: 1 }).toInt(),
    ...jobListRules,
  ),
  async (req, res) => {
    const q = req.query as Record<string, string | undefined>;
    res.json(
      await listJobs(req.user!, {
        status: q.status ? (q.status.split(',') as JobStatus[]) : undefined,
        technicianId: q.technicianId ? Number(q.technicianId) : undefined,
        q: q.q || undefined,
        sort: q.sort as JobSort | undefined,
        dir: q.dir as 'asc' | 'desc' | undefined,
        page: q.page ? Number(q.page) : undefined,
        pageSize: q.pageSize ? Number(q.pageSize) : undefined,
      }),
    );
  },
);

jobsRouter.post('/', jobManagers, validate(...jobCreateRules), async (req, res) => {
  res.status(201).json({ job: await createJob(req.user!, pickJobInput(req.body)) });
});

// POST /api/jobs/reassign: several jobs to one technician, all or none.
jobsRouter.post(
  '/reassign',
  jobManagers,
  validate(
    body('jobIds', 'A list of 1 to 200 job ids').isArray({ min: 1, max: 200 }),
    body('jobIds.*', 'Job ids are whole numbers').isInt({ min: 1 }).toInt(),
    body('technicianId', 'Choose a technician').isInt({ min: 1 }).toInt(),
  ),
  async (req, res) => {
    res.json(await reassignJobs(req.user!, { jobIds: req.body.jobIds, technicianId: req.body.technicianId }));
  },
);

jobsRouter.get('/:id', anyJobReader, validate(jobId), async (req, res) => {
  res.json(await getJobDetail(req.user!, Number(req.params.id)));
});

jobsRouter.patch('/:id', jobManagers, validate(jobId, ...jobUpdateRules), async (req, res) => {
  const { technicianId, dueAt, priority, siteVisitDate } = req.body;
  // Contacts sent (even blank, which clears one) change; contacts not sent stay as they are.
  const contacts = pickContacts(req.body);
  const sentContacts = Object.fromEntries(CONTACT_FIELDS.filter((f) => req.body[f] !== undefined).map((f) => [f, contacts[f]]));
  res.json({ job: await updateJob(req.user!, Number(req.params.id), { technicianId, dueAt, priority, siteVisitDate, ...sentContacts }) });
});

jobsRouter.put('/:id/record', technicianOnly, requireBaseVersion, validate(jobId, ...captureRecordRules), async (req, res) => {
  res.json(await saveDraft(req.user!, Number(req.params.id), req.body as CaptureRecord, req.baseVersion!));
});

jobsRouter.post('/:id/submit', technicianOnly, requireBaseVersion, validate(jobId, ...captureRecordRules), async (req, res) => {
  res.status(201).json(await submitRecord(req.user!, Number(req.params.id), req.body as CaptureRecord, req.baseVersion!));
});

jobsRouter.get(
  '/:id/revisions/:number',
  anyJobReader,
  validate(jobId, param('number', 'Must be a revision number').isInt({ min: 1 }).toInt()),
  async (req, res) => {
    res.json({ revision: await getRevision(req.user!, Number(req.params.id), Number(req.params.number)) });
  },
);

// Uploads are held in memory only long enough to check and hash them, then go to S3.
// defParamCharset exists in multer 2 but not yet in its type declarations.
const upload = multer({
  storage: multer.memoryStorage(),
  limits: { fileSize: config.uploadMaxBytes, files: 1, fields: 5, parts: 8 },
  // File names are UTF-8 in every browser today; busboy's default would mangle Küche–Süd.png.
  defParamCharset: 'utf8',
} as multer.Options);
const singleFile = (
  req: Parameters<ReturnType<typeof upload.single>>[0],
  res: Parameters<ReturnType<typeof upload.single>>[1],
  next: (err?: unknown) => void,
) =>
  upload.single('file')(req, res, (err: unknown) => {
    if (err instanceof multer.MulterError && err.code === 'LIMIT_FILE_SIZE') {
      return next(new HttpError(413, 'too_large', tooLargeMessage(), { file: tooLargeMessage() }));
    }
    // Two files, a file under another field name, too many parts, or a body cut short.
    if (err instanceof multer.MulterError)
      return next(invalid({ [err.field ?? 'file']: MULTIPART_PROBLEMS[err.code] ?? 'Send one file in the field "file"' }));
    if (err instanceof Error && /Unexpected end of form|Malformed part header|Multipart: Boundary not found/.test(err.message)) {
      return next(invalid({ file: 'The upload was cut short or is not a valid form; send it again.' }));
    }
    next(err);
  });

const MULTIPART_PROBLEMS: Partial<Record<string, string>> = {
  LIMIT_FILE_COUNT: 'Send one file at a time',
  LIMIT_UNEXPECTED_FILE: 'Send the file in the field "file"',
  LIMIT_PART_COUNT: 'Too many parts in the form',
  LIMIT_FIELD_COUNT: 'Too many fields in the form',
};

// Refused from the declared length before a byte of the body is read: a file that can never
// pass is not uploaded in full first. Multipart framing adds a little, hence the allowance.
const MULTIPART_ALLOWANCE = 64 * 1024;
function refuseDeclaredOversize(req: Request, _res: Response, next: NextFunction) {
  const declared = Number(req.get('Content-Length'));
  if (Number.isFinite(declared) && declared > config.uploadMaxBytes + MULTIPART_ALLOWANCE) {
    req.socket.setTimeout(5000);
    next(new HttpError(413, 'too_large', tooLargeMessage(declared), { file: tooLargeMessage(declared) }));
    return;
  }
  next();
}

function tooLargeMessage(bytes?: number) {
  return fileTooLargeMessage(config.uploadMaxBytes, bytes);
}

jobsRouter.post(
  '/:id/files',
  technicianOnly,
  refuseDeclaredOversize,
  singleFile,
  validate(
    jobId,
    body('kind', `Choose one of: ${UPLOAD_KINDS.join(', ')}`).isIn(UPLOAD_KINDS),
    body('file', 'Choose a file to upload').custom((_v, { req }) => Boolean(req.file && req.file.size > 0)),
  ),
  async (req, res) => {
    res.status(201).json({ file: await uploadFile(req.user!, Number(req.params.id), req.body.kind as UploadKind, req.file!) });
  },
);

// The station-layout analysis: of a submitted revision, or (no revision) of the working record.
jobsRouter.get(
  '/:id/station-analysis',
  anyJobReader,
  validate(jobId, query('revision', 'Must be a revision number').optional().isInt({ min: 1 }).toInt()),
  async (req, res) => {
    res.json(await stationAnalysisFor(req.user!, Number(req.params.id), req.query.revision ? Number(req.query.revision) : null));
  },
);

jobsRouter.patch(
  '/:id/files/:fileId',
  technicianOnly,
  validate(
    jobId,
    param('fileId', 'Must be a file id').isInt({ min: 1 }).toInt(),
    body('caption', `Text of at most ${CAPTION_MAX_LENGTH} characters`).isString().isLength({ max: CAPTION_MAX_LENGTH }),
  ),
  async (req, res) => {
    res.json({ file: await captionFile(req.user!, Number(req.params.id), Number(req.params.fileId), req.body.caption) });
  },
);

jobsRouter.delete(
  '/:id/files/:fileId',
  technicianOnly,
  validate(jobId, param('fileId', 'Must be a file id').isInt({ min: 1 }).toInt()),
  async (req, res) => {
    await detachFile(req.user!, Number(req.params.id), Number(req.params.fileId));
    res.status(204).end();
  },
);
