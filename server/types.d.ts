import type { SessionUser } from '../shared/api-types';

declare global {
  namespace Express {
    // eslint-disable-next-line @typescript-eslint/no-empty-object-type
    interface User extends SessionUser {}
    interface Request {
      // From If-Match, set by requireBaseVersion.
      baseVersion?: number;
    }
  }
}

export {};
