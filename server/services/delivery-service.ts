// Delivery to the adjuster. Acceptance queues a build in its own transaction; any instance's
// worker leases the row, builds the summary PDF, stores it with the job's files and, for an
// acceptance, queues the adjuster's e-mail with a fresh share link, in one transaction. An
// object-storage outage only delays it (backoff, then "failed" shown to managers).
import crypto from 'node:crypto';
import type { Readable } from 'node:stream';

import { Op, type Transaction } from 'sequelize';

import type { DeliveryState } from '../../shared/api-types';
import { deliverySummary, type SummaryInput } from '../../shared/delivery-summary';
import { config } from '../config';
import { inTransaction } from '../db';
import { renderSummaryPdf, type SummaryPhoto } from '../delivery/summary-pdf';
import { HttpError, notFound } from '../errors';
import { deliveryEmail } from '../mail/templates';
import { CaptureRevision, Delivery, Job, Review, Rubric, StoredFile, User } from '../models';
import { getObjectStream, putObject } from '../storage/s3';
import { recordEvent } from './audit-service';
import { backoffSeconds, enqueueEmail } from './outbox-service';
import { issueShareLink, listShareLinks } from './share-service';

const PHOTO_LIMIT_BYTES = 8 * 1024 * 1024;

export async function queueDelivery(transaction: Transaction, jobId: number, options: { notify: boolean; requestedById: number | null }) {
  await Delivery.create(
    {
      jobId,
      notify: options.notify,
      requestedById: options.requestedById,
      lastError: null,
      nextAttemptAt: new Date(),
      lockedBy: null,
      lockedUntil: null,
      fileId: null,
      builtAt: null,
    },
    { transaction },
  );
  await recordEvent(transaction, jobId, options.requestedById, 'summary_queued', { notify: options.notify });
}

// A manager's "build the summary again": only for an accepted job.
export async function requestSummary(actorId: number, jobId: number) {
  await inTransaction(async (transaction) => {
    const job = await Job.findByPk(jobId, { transaction });
    if (!job) throw notFound('Job');
    if (job.status !== 'accepted') throw new HttpError(409, 'not_accepted', 'A summary is built for an accepted job only.');
    await queueDelivery(transaction, jobId, { notify: false, requestedById: actorId });
  });
}

async function streamToBuffer(stream: Readable, limit: number): Promise<Buffer | null> {
  const chunks: Buffer[] = [];
  let size = 0;
  for await (const chunk of stream) {
    size += (chunk as Buffer).length;
    if (size > limit) return null;
    chunks.push(chunk as Buffer);
  }
  return Buffer.concat(chunks);
}

// Everything the summary says, read from the accepted revision and its review.
export async function summaryInputFor(jobId: number): Promise<SummaryInput & { technicianId: number }> {
  const job = await Job.findByPk(jobId, { include: [{ model: User, as: 'technician', attributes: ['id', 'name'] }] });
  if (!job) throw notFound('Job');
  const review = await Review.findOne({ where: { jobId, kind: 'primary', decision: 'accept' }, order: [['id', 'DESC']] });
  if (!review) throw new HttpError(409, 'not_accepted', 'This job has no accepted review yet.');
  const [revision, rubric, reviewer] = await Promise.all([
    CaptureRevision.findOne({ where: { jobId, number: review.revisionNumber } }),
    Rubric.findByPk(review.rubricId),
    User.findByPk(review.reviewerId, { attributes: ['name'] }),
  ]);
  if (!revision) throw notFound('Revision');
  const record = revision.data;
  const photoIds = [...new Set(record.damageAreas.flatMap((d) => d.photoFileIds))];
  const photos = photoIds.length ? await StoredFile.findAll({ where: { id: photoIds, jobId, kind: 'photo' } }) : [];
  return {
    technicianId: job.technicianId,
    job: {
      claimReference: job.claimReference,
      street: job.street,
      city: job.city,
      postcode: job.postcode,
      propertyType: job.propertyType,
      lossType: job.lossType,
      lossDate: job.lossDate,
      siteVisitDate: job.siteVisitDate,
    },
    contacts: { clientName: job.clientName, adjusterName: job.adjusterName },
    technicianName: job.technician!.name,
    record,
    revision: review.revisionNumber,
    plans: (revision.stationAnalysis?.levels ?? []).map((l) => ({
      level: l.level,
      stations: l.stations.map((s) => ({ number: s.number, x: s.x, y: s.y, kind: s.kind })),
      links: l.chain.filter((c) => c.from !== null).map((c) => ({ from: c.from!, to: c.station, weak: c.weak })),
    })),
    review: {
      score: review.score === null ? null : Number(review.score),
      passMark: Number(rubric?.passMark ?? 0),
      reviewerName: reviewer?.name ?? 'Reviewer',
      decidedAt: review.decidedAt.toISOString(),
    },
    photos: photos.map((p) => ({ id: p.id, name: p.originalName, caption: p.caption ?? null })),
  };
}

async function photoBytes(jobId: number, ids: number[]): Promise<SummaryPhoto[]> {
  const files = ids.length ? await StoredFile.findAll({ where: { id: ids, jobId } }) : [];
  return Promise.all(
    files.map(async (f) => ({
      id: f.id,
      name: f.originalName,
      // pdfkit embeds JPEG and PNG; other photos are named, and shown on the shared page.
      jpegOrPng: ['image/jpeg', 'image/png'].includes(f.contentType)
        ? await streamToBuffer(await getObjectStream(f.storageKey), PHOTO_LIMIT_BYTES)
        : null,
    })),
  );
}

async function build(delivery: Delivery) {
  const input = await summaryInputFor(delivery.jobId);
  const summary = deliverySummary(input);
  const pdf = await renderSummaryPdf(
    summary,
    await photoBytes(
      delivery.jobId,
      input.photos.map((p) => p.id),
    ),
  );
  const sha256 = crypto.createHash('sha256').update(pdf).digest('hex');
  const storageKey = `jobs/${delivery.jobId}/summary-${crypto.randomUUID()}.pdf`;
  await putObject(storageKey, pdf, 'application/pdf', sha256);
  await inTransaction(async (transaction) => {
    const job = (await Job.findByPk(delivery.jobId, { transaction, lock: transaction.LOCK.UPDATE }))!;
    // One current summary: the earlier ones leave the file list (their objects stay, like any detached file).
    await StoredFile.update({ detachedAt: new Date() }, { where: { jobId: job.id, kind: 'summary', detachedAt: null }, transaction });
    const file = await StoredFile.create(
      {
        jobId: job.id,
        kind: 'summary',
        originalName: `Capture summary ${job.claimReference}.pdf`,
        contentType: 'application/pdf',
        sizeBytes: pdf.length,
        sha256,
        storageKey,
        uploadedById: delivery.requestedById ?? input.technicianId,
        detachedAt: null,
      },
      { transaction },
    );
    await delivery.update(
      { status: 'built', builtAt: new Date(), fileId: file.id, lockedBy: null, lockedUntil: null, lastError: null },
      { transaction },
    );
    await recordEvent(transaction, job.id, null, 'summary_built', { fileId: file.id, bytes: pdf.length });
    if (delivery.notify && job.adjusterEmail) {
      const { url } = await issueShareLink(transaction, job.id, null);
      await enqueueEmail(transaction, {
        ...deliveryEmail(
          { claimReference: job.claimReference, street: job.street, city: job.city, adjusterName: job.adjusterName },
          url,
          config.shareLinkDays,
        ),
        jobId: job.id,
        kind: 'delivery',
        to: [job.adjusterEmail],
      });
    }
  });
}

// One pass of the worker: lease due rows with a conditional UPDATE, so two instances never
// build the same one, then build each.
export async function buildPendingSummaries(instanceId = config.instanceId, now = new Date()) {
  const leaseUntil = new Date(now.getTime() + config.outbox.lockSeconds * 1000);
  await Delivery.update(
    { lockedBy: instanceId, lockedUntil: leaseUntil },
    {
      where: { status: 'pending', nextAttemptAt: { [Op.lte]: now }, [Op.or]: [{ lockedUntil: null }, { lockedUntil: { [Op.lt]: now } }] },
      limit: 5,
    },
  );
  const leased = await Delivery.findAll({
    where: { lockedBy: instanceId, lockedUntil: leaseUntil, status: 'pending' },
    order: [['id', 'ASC']],
  });
  for (const delivery of leased) {
    try {
      await build(delivery);
    } catch (error) {
      const attempts = delivery.attempts + 1;
      const final = attempts >= config.outbox.maxAttempts || (error instanceof HttpError && error.status < 500 && error.status !== 503);
      await delivery.update({
        attempts,
        status: final ? 'failed' : 'pending',
        lastError: (error as Error).message.slice(0, 2000),
        nextAttemptAt: new Date(Date.now() + backoffSeconds(attempts) * 1000),
        lockedBy: null,
        lockedUntil: null,
      });
    }
  }
  return { leased: leased.length };
}

export async function deliveryState(jobId: number): Promise<DeliveryState> {
  const job = await Job.findByPk(jobId, { attributes: ['id', 'status'] });
  if (!job) throw notFound('Job');
  const [links, deliveries, summary] = await Promise.all([
    listShareLinks(jobId),
    Delivery.findAll({ where: { jobId }, order: [['id', 'DESC']], limit: 10 }),
    StoredFile.findOne({ where: { jobId, kind: 'summary', detachedAt: null }, order: [['id', 'DESC']] }),
  ]);
  return {
    accepted: job.status === 'accepted',
    links,
    deliveries: deliveries.map((d) => ({
      id: d.id,
      status: d.status,
      notify: d.notify,
      createdAt: d.createdAt.toISOString(),
      builtAt: d.builtAt?.toISOString() ?? null,
      lastError: d.lastError,
    })),
    summaryFileId: summary?.id ?? null,
  };
}

export async function currentSummaryFile(jobId: number) {
  return StoredFile.findOne({ where: { jobId, kind: 'summary', detachedAt: null }, order: [['id', 'DESC']] });
}
