// Sets up browser-test data through the public API, as the people themselves would.
import type { APIRequestContext } from 'playwright-core';

import { DEMO_PASSWORD, DEMO_PEOPLE } from '../../seeders/data/demo-people';
import type { CaptureRecord } from '../../shared/capture-record';
import { BASE_URL } from './browser';

const HEADERS = { 'x-sightline-request': '1' };

export const demoPerson = (emailStart: string) => DEMO_PEOPLE.find((p) => p.email.startsWith(emailStart))!;

export async function as<T>(api: APIRequestContext, emailStart: string, work: () => Promise<T>): Promise<T> {
  const res = await api.post(`${BASE_URL}/api/session`, {
    headers: HEADERS,
    data: { email: demoPerson(emailStart).email, password: DEMO_PASSWORD },
  });
  if (!res.ok()) throw new Error(`sign-in failed: ${res.status()}`);
  try {
    return await work();
  } finally {
    await api.delete(`${BASE_URL}/api/session`, { headers: HEADERS });
  }
}

export async function call<T = unknown>(
  api: APIRequestContext,
  method: 'get' | 'post' | 'put' | 'delete',
  path: string,
  data?: object,
  headers: Record<string, string> = {},
): Promise<T> {
  const res = await api[method](`${BASE_URL}${path}`, { headers: { ...HEADERS, ...headers }, data });
  if (!res.ok()) throw new Error(`${method.toUpperCase()} ${path}: ${res.status()} ${await res.text()}`);
  return (res.status() === 204 ? undefined : await res.json()) as T;
}

// A job for a demo technician, created by the manager, still a draft.
export async function draftJob(
  api: APIRequestContext,
  options: { technician: string; claimReference: string; dueInHours: number; lossType?: string },
) {
  return as(api, 'mara.', async () => {
    const { technicians } = await call<{ technicians: { id: number; name: string }[] }>(api, 'get', '/api/technicians');
    const technician = technicians.find((t) => t.name === demoPerson(options.technician).name)!;
    const { job } = await call<{ job: { id: number } }>(api, 'post', '/api/jobs', {
      claimReference: options.claimReference,
      street: '31 Undlecote Mews',
      city: 'Maraskell',
      postcode: 'MK-4410',
      propertyType: 'single_family',
      lossType: options.lossType ?? 'water',
      lossDate: '2026-11-24',
      siteVisitDate: '2026-11-26',
      dueAt: new Date(Date.now() + options.dueInHours * 3_600_000).toISOString(),
      priority: 'normal',
      technicianId: technician.id,
    });
    return job.id;
  });
}

// A job for a demo technician, created by the manager and submitted by the technician.
export async function submittedJob(
  api: APIRequestContext,
  options: { technician: string; claimReference: string; dueInHours: number; record: CaptureRecord; lossType?: string },
) {
  const jobId = await draftJob(api, options);
  // A new job starts with an empty draft at version 1: the submit is based on it.
  await as(api, options.technician, () => call(api, 'post', `/api/jobs/${jobId}/submit`, options.record, { 'If-Match': '"1"' }));
  return jobId;
}
