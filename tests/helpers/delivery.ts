// An accepted job ready for delivery: a photo of the damage in object storage, the accepted
// review, a summary PDF file and a live share link (its raw token returned).
import { inTransaction } from '../../server/db';
import { issueShareLink } from '../../server/services/share-service';
import { putObject } from '../../server/storage/s3';
import { createJob, createReview, createRevision, createStoredFile, createUser } from './factories';
import { completeRecord } from './records';
import { PNG_1X1 } from './sample-files';

const TINY_PDF = Buffer.from('%PDF-1.4\n1 0 obj<</Type/Catalog>>endobj\ntrailer<</Root 1 0 R>>\n%%EOF\n');

export async function deliverableJob(technicianId?: number) {
  const job = await createJob({ technicianId });
  const photo = await createStoredFile(job.id, job.technicianId, { sizeBytes: PNG_1X1.length });
  await putObject(photo.storageKey, PNG_1X1, 'image/png', photo.sha256);
  const record = completeRecord({
    damageAreas: [{ key: 'd1', roomKey: 'r1', description: 'Stain', lossType: 'water', stationNumbers: [1], photoFileIds: [photo.id] }],
  });
  await createRevision(job, 1, record);
  const reviewer = await createUser({ role: 'reviewer' });
  await createReview(job, reviewer.id, 'accept');
  await job.update({ status: 'accepted', currentRevision: 1 });
  const summary = await createStoredFile(job.id, job.technicianId, {
    kind: 'summary',
    originalName: `Capture summary ${job.claimReference}.pdf`,
    contentType: 'application/pdf',
    sizeBytes: TINY_PDF.length,
  });
  await putObject(summary.storageKey, TINY_PDF, 'application/pdf', summary.sha256);
  const { token, link } = await inTransaction((t) => issueShareLink(t, job.id, null));
  return { job, photo, token, link, summary };
}
