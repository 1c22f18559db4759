// What a share link shows: the acceptance summary of its one job, the summary PDF and the
// photos the summary names. Nothing else of Sightline: no other job, no internal comments.
import type { SharedSummary } from '../../shared/api-types';
import { deliverySummary } from '../../shared/delivery-summary';
import { notFound } from '../errors';
import { StoredFile } from '../models';
import { getObjectStream } from '../storage/s3';
import { currentSummaryFile, summaryInputFor } from './delivery-service';
import { storageUnavailable } from './files-service';
import { recordShareView, resolveShareToken } from './share-service';

export async function sharedSummary(token: string, ip: string | undefined): Promise<SharedSummary> {
  const jobId = await resolveShareToken(token);
  const { technicianId: _technician, ...input } = await summaryInputFor(jobId);
  const [summary, pdf] = [deliverySummary(input), await currentSummaryFile(jobId)];
  await recordShareView(jobId, 'page', ip);
  return { summary, pdfAvailable: pdf !== null };
}

async function open(file: StoredFile) {
  try {
    return { file, stream: await getObjectStream(file.storageKey) };
  } catch {
    throw storageUnavailable();
  }
}

export async function sharedSummaryPdf(token: string, ip: string | undefined) {
  const jobId = await resolveShareToken(token);
  const file = await currentSummaryFile(jobId);
  if (!file) throw notFound('The summary PDF');
  await recordShareView(jobId, 'pdf', ip);
  return open(file);
}

// Only photos of the accepted record's damage areas, of this link's job.
export async function sharedPhoto(token: string, fileId: number) {
  const jobId = await resolveShareToken(token);
  const input = await summaryInputFor(jobId);
  if (!input.photos.some((p) => p.id === fileId)) throw notFound('Photo');
  const file = await StoredFile.findOne({ where: { id: fileId, jobId, kind: 'photo' } });
  if (!file) throw notFound('Photo');
  return open(file);
}
