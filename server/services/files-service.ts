import crypto from 'node:crypto';

import { fromBuffer } from 'file-type';

import { ACCEPTED_DESCRIPTION, ACCEPTED_TYPES, FILE_KIND_LABELS, type UploadKind } from '../../shared/files';
import { HttpError, invalid, notFound } from '../errors';
import { StoredFile } from '../models';
import { deleteObject, getObjectStream, putObject, StorageUnavailable } from '../storage/s3';
import { assertAssignedTechnician, findJobFor } from './job-access';
import { assertValidStationFile } from './station-service';

type Actor = Express.User;

export const storageUnavailable = () =>
  new HttpError(503, 'storage_unavailable', 'File storage cannot be reached right now. Please try again.');

// The file's type is read from its bytes; the name and the browser's claim are ignored.
export async function sniffContentType(buffer: Buffer): Promise<string | null> {
  const detected = await fromBuffer(buffer);
  if (detected) return detected.mime;
  return looksLikeCsv(buffer) ? 'text/csv' : null;
}

function looksLikeCsv(buffer: Buffer) {
  const text = buffer.toString('utf8');
  if (text.includes('\uFFFD') || /[\x00-\x08\x0E-\x1F]/.test(text)) return false;
  const firstLine = text.split(/\r?\n/, 1)[0] ?? '';
  return firstLine.includes(',') && text.length > 0;
}

// Files belong to a record still being worked on; once a job is accepted or sent for a new
// visit, its files are part of what was reviewed and stay as they are.
function assertFilesEditable(status: string) {
  if (status === 'accepted' || status === 'recapture_required') {
    throw new HttpError(409, 'conflict', 'Files cannot be added to or removed from a job that has been accepted or sent for recapture.');
  }
}

export async function uploadFile(actor: Actor, jobId: number, kind: UploadKind, upload: { originalname: string; buffer: Buffer }) {
  const job = await findJobFor(actor, jobId);
  assertAssignedTechnician(actor, job);
  assertFilesEditable(job.status);
  const contentType = await sniffContentType(upload.buffer);
  if (!contentType || !ACCEPTED_TYPES[kind].includes(contentType)) {
    throw invalid({
      file: `A ${FILE_KIND_LABELS[kind].toLowerCase()} must be ${ACCEPTED_DESCRIPTION[kind]}; this file's content is ${contentType ?? 'not a recognised type'}.`,
    });
  }
  if (kind === 'station_coordinates') assertValidStationFile(upload.buffer);
  const sha256 = crypto.createHash('sha256').update(upload.buffer).digest('hex');
  const storageKey = `jobs/${jobId}/${crypto.randomUUID()}`;
  try {
    await putObject(storageKey, upload.buffer, contentType, sha256);
  } catch (error) {
    if (error instanceof StorageUnavailable) throw storageUnavailable();
    throw error;
  }
  try {
    const file = await StoredFile.create({
      jobId,
      kind,
      originalName: upload.originalname.slice(0, 255) || 'upload',
      contentType,
      sizeBytes: upload.buffer.length,
      sha256,
      storageKey,
      uploadedById: actor.id,
      detachedAt: null,
    });
    return file.toView();
  } catch (error) {
    // Leave no orphan object behind when the row cannot be written.
    await deleteObject(storageKey).catch(() => undefined);
    throw error;
  }
}

export async function openFile(actor: Actor, fileId: number) {
  const file = await StoredFile.findByPk(fileId);
  if (!file) throw notFound('File');
  await findJobFor(actor, file.jobId);
  try {
    return { file, stream: await getObjectStream(file.storageKey) };
  } catch {
    throw storageUnavailable();
  }
}

export async function captionFile(actor: Actor, jobId: number, fileId: number, caption: string) {
  const job = await findJobFor(actor, jobId);
  assertAssignedTechnician(actor, job);
  assertFilesEditable(job.status);
  const file = await StoredFile.findOne({ where: { id: fileId, jobId, detachedAt: null } });
  if (!file) throw notFound('File');
  await file.update({ caption: caption.trim() || null });
  return file.toView();
}

export async function detachFile(actor: Actor, jobId: number, fileId: number) {
  const job = await findJobFor(actor, jobId);
  assertAssignedTechnician(actor, job);
  assertFilesEditable(job.status);
  const file = await StoredFile.findOne({ where: { id: fileId, jobId, detachedAt: null } });
  if (!file) throw notFound('File');
  await file.update({ detachedAt: new Date() });
}
