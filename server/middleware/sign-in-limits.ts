import crypto from 'node:crypto';

import type { Request, Response } from 'express';
import { rateLimit } from 'express-rate-limit';
import { slowDown } from 'express-slow-down';

import { config } from '../config';
import { MariaDbRateLimitStore } from './rate-limit-store';

const windowMs = config.signInLimits.windowMinutes * 60_000;

// The account an attempt is aimed at, folded the way MariaDB compares e-mails (case and
// accents ignored), so Tess@… and tëss@… count against one account; hashed so that any typed
// length fits the key column.
export function accountKey(email: unknown): string {
  const folded = typeof email === 'string' ? email.normalize('NFKD').replace(/\p{M}/gu, '').trim().toLowerCase() : '';
  return folded ? crypto.createHash('sha256').update(folded).digest('hex') : 'blank';
}

function refuse(_req: Request, res: Response) {
  res.status(429).json({
    error: {
      code: 'too_many_attempts',
      message: `Too many failed sign-in attempts. Try again in ${config.signInLimits.windowMinutes} minutes.`,
    },
  });
}

// Only failed attempts count, so a busy office behind one address is not locked out by
// colleagues who type their password right.
export const signInLimitPerIp = rateLimit({
  windowMs,
  limit: config.signInLimits.failuresPerIp,
  skipSuccessfulRequests: true,
  standardHeaders: 'draft-8',
  legacyHeaders: false,
  store: new MariaDbRateLimitStore('signin-ip'),
  handler: refuse,
});

// Per account, failures are slowed down rather than locked out: a hard lock would let anyone
// lock anyone out by typing wrong passwords for them (OWASP ASVS 4.0 V2.2.1). After the free
// attempts each further failure waits twice as long (0.5 s, 1 s, 2 s … up to 8 s); the
// owner's reset link clears the count at once.
export const signInSlowDownPerAccount = slowDown({
  windowMs,
  delayAfter: config.signInLimits.failuresPerAccount,
  delayMs: (used: number) => Math.min(500 * 2 ** (used - config.signInLimits.failuresPerAccount - 1), 8000),
  maxDelayMs: 8000,
  skipSuccessfulRequests: true,
  store: new MariaDbRateLimitStore('signin-account'),
  keyGenerator: (req) => accountKey(req.body?.email),
  validate: { delayMs: false },
});

// Password-reset requests per address: enough for a person, too few to flood someone's inbox.
export const passwordResetLimitPerIp = rateLimit({
  windowMs,
  limit: config.signInLimits.failuresPerIp,
  standardHeaders: 'draft-8',
  legacyHeaders: false,
  store: new MariaDbRateLimitStore('reset-ip'),
  handler: (_req: Request, res: Response) =>
    res.status(429).json({
      error: { code: 'too_many_attempts', message: `Too many requests. Try again in ${config.signInLimits.windowMinutes} minutes.` },
    }),
});
