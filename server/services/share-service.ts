// Read-only links for the adjuster: a random 256-bit token, of which only the SHA-256 is
// stored; one live link per job (issuing a new one ends the old), expiring, revocable.
import crypto from 'node:crypto';

import type { Transaction } from 'sequelize';

import type { ShareLinkView } from '../../shared/api-types';
import { config } from '../config';
import { inTransaction } from '../db';
import { HttpError, notFound } from '../errors';
import { ShareLink } from '../models';
import { recordEvent } from './audit-service';

export const TOKEN_PATTERN = /^[A-Za-z0-9_-]{43}$/;
const hashOf = (token: string) => crypto.createHash('sha256').update(token).digest('hex');
export const shareUrl = (token: string) => `${config.appUrl}/s/${token}`;

export function linkState(link: Pick<ShareLink, 'revokedAt' | 'expiresAt'>, now = new Date()): ShareLinkView['state'] {
  if (link.revokedAt) return 'revoked';
  return link.expiresAt <= now ? 'expired' : 'active';
}

export async function issueShareLink(transaction: Transaction, jobId: number, actorId: number | null) {
  const token = crypto.randomBytes(32).toString('base64url');
  const now = new Date();
  await ShareLink.update({ revokedAt: now }, { where: { jobId, revokedAt: null }, transaction });
  const link = await ShareLink.create(
    {
      jobId,
      tokenHash: hashOf(token),
      createdById: actorId,
      expiresAt: new Date(now.getTime() + config.shareLinkDays * 86_400_000),
      revokedAt: null,
    },
    { transaction },
  );
  await recordEvent(transaction, jobId, actorId, 'share_link_issued', { linkId: link.id, expiresAt: link.expiresAt.toISOString() });
  return { link, token, url: shareUrl(token) };
}

export async function revokeShareLink(jobId: number, linkId: number, actorId: number) {
  await inTransaction(async (transaction) => {
    const link = await ShareLink.findOne({ where: { id: linkId, jobId }, transaction, lock: transaction.LOCK.UPDATE });
    if (!link) throw notFound('Link');
    if (link.revokedAt) return;
    await link.update({ revokedAt: new Date() }, { transaction });
    await recordEvent(transaction, jobId, actorId, 'share_link_revoked', { linkId });
  });
}

export async function listShareLinks(jobId: number): Promise<ShareLinkView[]> {
  const links = await ShareLink.findAll({ where: { jobId }, order: [['id', 'DESC']] });
  return links.map((l) => ({
    id: l.id,
    createdAt: l.createdAt.toISOString(),
    expiresAt: l.expiresAt.toISOString(),
    revokedAt: l.revokedAt?.toISOString() ?? null,
    state: linkState(l),
  }));
}

// The job a token opens. Unknown or malformed: 404, the same answer whether or not any job
// exists; expired or revoked: 410, saying which, and nothing about the job.
export async function resolveShareToken(token: string): Promise<number> {
  const link = TOKEN_PATTERN.test(token) ? await ShareLink.findOne({ where: { tokenHash: hashOf(token) } }) : null;
  if (!link)
    throw new HttpError(404, 'not_found', 'This link is not valid. Check that it was copied whole, or ask the sender for a new one.');
  const state = linkState(link);
  if (state === 'revoked') throw new HttpError(410, 'link_revoked', 'This link has been withdrawn by the sender. Ask them for a new one.');
  if (state === 'expired')
    throw new HttpError(
      410,
      'link_expired',
      `This link expired on ${link.expiresAt.toISOString().slice(0, 10)}. Ask the sender for a new one.`,
    );
  return link.jobId;
}

// The viewer's address, shortened so it identifies a network and not a person:
// IPv4 to its /24, IPv6 to its /48.
export function truncatedAddress(ip: string | undefined): string {
  if (!ip) return 'unknown';
  const v4 = ip.replace(/^::ffff:/, '');
  if (/^\d+\.\d+\.\d+\.\d+$/.test(v4)) return `${v4.split('.').slice(0, 3).join('.')}.0/24`;
  return `${ip.split(':').slice(0, 3).join(':')}::/48`;
}

export async function recordShareView(jobId: number, what: 'page' | 'pdf', ip: string | undefined) {
  await inTransaction((transaction) => recordEvent(transaction, jobId, null, 'share_viewed', { what, address: truncatedAddress(ip) }));
}
