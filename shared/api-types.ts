// Shapes the API sends and receives, shared so client and server cannot drift apart.
import type { Role } from './roles';

export type ApiErrorBody = {
  error: { code: string; message: string; fields?: Record<string, string> };
};

export type SessionUser = { id: number; name: string; email: string; role: Role };

export type UserRow = SessionUser & { active: boolean; createdAt: string };
