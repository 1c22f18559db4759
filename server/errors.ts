// One error type for the whole API; the error handler turns it into
// { error: { code, message, fields? } } with the matching status.
export class HttpError extends Error {
  constructor(
    readonly status: number,
    readonly code: string,
    message: string,
    readonly fields?: Record<string, string>,
    // Sent beside the error, e.g. the current version of a draft that a stale save collided with.
    readonly extra?: Record<string, unknown>,
  ) {
    super(message);
  }
}

export const notFound = (what: string) => new HttpError(404, 'not_found', `${what} was not found.`);
export const forbidden = (message = 'Your role does not allow this.') => new HttpError(403, 'forbidden', message);
export const conflict = (message: string) => new HttpError(409, 'conflict', message);
export const staleVersion = (what: string, current: unknown) =>
  new HttpError(409, 'stale_version', `${what} was changed elsewhere since you opened it. Choose which version to keep.`, undefined, {
    current,
  });
export const invalid = (fields: Record<string, string>) =>
  new HttpError(400, 'invalid_input', `Please correct: ${Object.keys(fields).join(', ')}.`, fields);
