import type { NextFunction, Request, Response } from 'express';
import { ConnectionError, DatabaseError, TimeoutError, UniqueConstraintError } from 'sequelize';

import { HttpError } from '../errors';

export function notFoundHandler(req: Request, _res: Response, next: NextFunction) {
  next(new HttpError(404, 'not_found', `No API route for ${req.method} ${req.path}.`));
}

type BodyParserError = { status?: number; statusCode?: number; type?: string; expose?: boolean };

// body-parser's refusals (a charset or Content-Encoding it cannot read, a body it cannot
// parse, one too large) carry their own 4xx status.
const BODY_ERRORS: Record<string, { status: number; code: string; message: string }> = {
  'entity.parse.failed': { status: 400, code: 'bad_request', message: 'The request body could not be read as JSON.' },
  'charset.unsupported': { status: 415, code: 'unsupported_charset', message: 'Send the body as UTF-8 JSON.' },
  'encoding.unsupported': { status: 415, code: 'unsupported_encoding', message: 'Send the body uncompressed, or gzip, deflate or br.' },
  'entity.too.large': { status: 413, code: 'too_large', message: 'The request is too large.' },
  'request.aborted': { status: 400, code: 'bad_request', message: 'The request was cut short.' },
  'entity.verify.failed': { status: 400, code: 'bad_request', message: 'The request body is not acceptable.' },
};

const LOCK_ERRNOS = new Set([1205, 1213]);

export function errorHandler(err: unknown, _req: Request, res: Response, _next: NextFunction) {
  if (err instanceof HttpError) {
    res
      .status(err.status)
      .json({ error: { code: err.code, message: err.message, ...(err.fields && { fields: err.fields }) }, ...err.extra });
    return;
  }
  const bodyError = BODY_ERRORS[(err as BodyParserError).type ?? ''];
  if (bodyError) {
    res.status(bodyError.status).json({ error: { code: bodyError.code, message: bodyError.message } });
    return;
  }
  // Two requests raced for the same unique value: the loser is told, not given a 500.
  if (err instanceof UniqueConstraintError) {
    const fields = Object.fromEntries(
      Object.keys(err.fields ?? {}).map((f) => [f.replace(/_([a-z])/g, (_m, c: string) => c.toUpperCase()), 'Already in use']),
    );
    res
      .status(409)
      .json({ error: { code: 'conflict', message: 'That value is already in use.', ...(Object.keys(fields).length && { fields }) } });
    return;
  }
  const errno = (err as { parent?: { errno?: number } }).parent?.errno;
  if (err instanceof DatabaseError && errno !== undefined && LOCK_ERRNOS.has(errno)) {
    res.status(409).json({ error: { code: 'busy', message: 'Someone else was changing the same thing; please try again.' } });
    return;
  }
  // The database is unreachable or too slow: a clear 503 that a client may retry.
  if (
    err instanceof ConnectionError ||
    err instanceof TimeoutError ||
    (err as { name?: string }).name === 'SequelizeConnectionAcquireTimeoutError'
  ) {
    res
      .status(503)
      .json({ error: { code: 'database_unavailable', message: 'Sightline cannot reach its database just now. Try again in a moment.' } });
    return;
  }
  const status = (err as BodyParserError).status ?? (err as BodyParserError).statusCode;
  if (status && status >= 400 && status < 500 && (err as BodyParserError).expose) {
    res.status(status).json({ error: { code: 'bad_request', message: 'The request could not be read.' } });
    return;
  }
  console.error(err);
  res.status(500).json({ error: { code: 'server_error', message: 'Something went wrong on our side. Please try again.' } });
}
