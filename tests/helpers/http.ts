import type { Express } from 'express';
import { QueryTypes } from 'sequelize';
import request from 'supertest';

import { sequelize } from '../../server/models';
import type { Role } from '../../shared/roles';
import { createUser, TEST_PASSWORD } from './factories';

export type Agent = ReturnType<typeof request.agent>;

// An agent that behaves like our client: it keeps the cookie and sends the CSRF header.
export function clientAgent(app: Express): Agent {
  return request.agent(app).set('x-sightline-request', '1') as unknown as Agent;
}

export async function signedInAgent(app: Express, role: Role) {
  const user = await createUser({ role });
  const agent = clientAgent(app);
  const res = await agent.post('/api/session').send({ email: user.email, password: TEST_PASSWORD });
  if (res.status !== 200) throw new Error(`sign-in failed for ${role}: ${res.status} ${JSON.stringify(res.body)}`);
  return { agent, user };
}

export async function resetSignInLimits() {
  await sequelize.query('DELETE FROM rate_limit_hits', { type: QueryTypes.DELETE });
}

export async function countRows(table: string): Promise<number> {
  const rows = await sequelize.query<{ n: number }>(`SELECT COUNT(*) AS n FROM \`${table}\``, { type: QueryTypes.SELECT });
  return Number(rows[0].n);
}

export type Sent = { status: number; body: any; headers: Record<string, string> };

// One call by method name, for the table-driven tests.
export type Upload = { field: string; buffer: Buffer; filename: string; fields: Record<string, string> };

export async function send(
  agent: Agent,
  method: string,
  path: string,
  body?: object,
  upload?: Upload,
  headers: Record<string, string> = {},
): Promise<Sent> {
  const call = (agent as unknown as Record<string, (p: string) => request.Test>)[method.toLowerCase()](path);
  for (const [name, value] of Object.entries(headers)) call.set(name, value);
  if (upload) {
    for (const [name, value] of Object.entries(upload.fields)) call.field(name, value);
    return call.attach(upload.field, upload.buffer, upload.filename) as unknown as Promise<Sent>;
  }
  return (body ? call.send(body) : call) as unknown as Promise<Sent>;
}

// A signed-in technician and a job assigned to them.
export async function technicianWithJob(app: Express) {
  const { createJob } = await import('./factories');
  const signed = await signedInAgent(app, 'technician');
  return { ...signed, job: await createJob({ technicianId: signed.user.id }) };
}

// The draft version a job's record is at now, for the If-Match of a save or a submit.
export async function recordVersionOf(agent: Agent, jobId: number): Promise<number> {
  const res = await agent.get(`/api/jobs/${jobId}`);
  return res.body.recordVersion ?? 0;
}

export async function saveRecordAs(agent: Agent, jobId: number, record: object) {
  return agent
    .put(`/api/jobs/${jobId}/record`)
    .set('If-Match', `"${await recordVersionOf(agent, jobId)}"`)
    .send(record);
}

export async function submitRecordAs(agent: Agent, jobId: number, record: object) {
  return agent
    .post(`/api/jobs/${jobId}/submit`)
    .set('If-Match', `"${await recordVersionOf(agent, jobId)}"`)
    .send(record);
}
