// The only place in the client that calls fetch. Every failure becomes an ApiError carrying
// the server's { code, message, fields }.
import type { ApiErrorBody } from '@/shared/api-types';

export class ApiError extends Error {
  constructor(
    readonly status: number,
    readonly code: string,
    message: string,
    readonly fields: Record<string, string> = {},
    // The whole answer, for errors that carry more than a message (a stale save's current draft).
    readonly body: unknown = null,
  ) {
    super(message);
  }
}

type Method = 'GET' | 'POST' | 'PATCH' | 'PUT' | 'DELETE';
// baseVersion: the draft version an edit is based on, sent as If-Match.
type Options = { baseVersion?: number; keepalive?: boolean };

async function request<T>(method: Method, path: string, body?: unknown, options: Options = {}): Promise<T> {
  let response: Response;
  try {
    response = await fetch(path, {
      method,
      credentials: 'same-origin',
      headers: {
        Accept: 'application/json',
        // Marks our own client; the server refuses state changes without it (CSRF defence).
        'X-Sightline-Request': '1',
        ...(body !== undefined && { 'Content-Type': 'application/json' }),
        ...(options.baseVersion !== undefined && { 'If-Match': `"${options.baseVersion}"` }),
      },
      body: body === undefined ? undefined : JSON.stringify(body),
      keepalive: options.keepalive,
    });
  } catch {
    throw new ApiError(0, 'offline', 'Sightline cannot be reached. Check your connection and try again.');
  }
  if (response.status === 204) return undefined as T;
  const payload = await response.json().catch(() => null);
  if (!response.ok) {
    const error = (payload as ApiErrorBody | null)?.error;
    throw new ApiError(
      response.status,
      error?.code ?? 'http_error',
      error?.message ?? `Request failed (${response.status}).`,
      error?.fields,
      payload,
    );
  }
  return payload as T;
}

// Uploads go through XMLHttpRequest because fetch cannot report upload progress.
function upload<T>(path: string, form: FormData, onProgress: (fraction: number) => void): Promise<T> {
  return new Promise((resolve, reject) => {
    const xhr = new XMLHttpRequest();
    xhr.open('POST', path);
    xhr.withCredentials = true;
    xhr.setRequestHeader('X-Sightline-Request', '1');
    xhr.setRequestHeader('Accept', 'application/json');
    xhr.upload.onprogress = (event) => {
      if (event.lengthComputable) onProgress(event.loaded / event.total);
    };
    xhr.onerror = () => reject(new ApiError(0, 'offline', 'The upload did not reach Sightline. Check your connection and retry.'));
    xhr.onload = () => {
      let payload: unknown = null;
      try {
        payload = JSON.parse(xhr.responseText);
      } catch {
        payload = null;
      }
      if (xhr.status >= 200 && xhr.status < 300) {
        onProgress(1);
        resolve(payload as T);
        return;
      }
      const error = (payload as ApiErrorBody | null)?.error;
      reject(new ApiError(xhr.status, error?.code ?? 'http_error', error?.message ?? `Upload failed (${xhr.status}).`, error?.fields));
    };
    xhr.send(form);
  });
}

export const api = {
  upload,
  get: <T>(path: string) => request<T>('GET', path),
  post: <T>(path: string, body?: unknown, options?: Options) => request<T>('POST', path, body ?? {}, options),
  patch: <T>(path: string, body: unknown) => request<T>('PATCH', path, body),
  put: <T>(path: string, body: unknown, options?: Options) => request<T>('PUT', path, body, options),
  delete: <T>(path: string) => request<T>('DELETE', path),
};
