// One error type for the whole API; the error handler turns it into
// { error: { code, message, fields? } } with the matching status.
export class HttpError extends Error {
  constructor(
    readonly status: number,
    readonly code: string,
    message: string,
    readonly fields?: Record<string, string>,
  ) {
    super(message);
  }
}

export const notFound = (what: string) => new HttpError(404, 'not_found', `${what} was not found.`);
export const forbidden = (message = 'Your role does not allow this.') => new HttpError(403, 'forbidden', message);
export const conflict = (message: string) => new HttpError(409, 'conflict', message);
export const invalid = (fields: Record<string, string>) =>
  new HttpError(400, 'invalid_input', `Please correct: ${Object.keys(fields).join(', ')}.`, fields);
