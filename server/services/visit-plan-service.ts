// The visit plan of a job, saved like the capture draft: the next version only when the
// client's edits were based on the current one; otherwise 409 with the current plan.
import type { Transaction } from 'sequelize';

import { CAMERA_CLASSES, type CameraClass } from '../../shared/capture-record';
import { EDITABLE_STATUSES, JOB_STATUS_LABELS, type JobStatus } from '../../shared/jobs';
import { emptyVisitPlan, type VisitPlan } from '../../shared/visit-plan';
import { type CameraClassSettings, DEFAULT_CAMERA_CLASS_SETTINGS } from '../../shared/visit-settings';
import { minutesOnSite, visitEstimate } from '../../shared/visit-suggestions';
import { inTransaction } from '../db';
import { conflict, forbidden, invalid, staleVersion } from '../errors';
import { CameraClassSetting, VisitPlanRow } from '../models';
import { findJobFor } from './job-access';

type Actor = Express.User;

export type PlanView = { plan: VisitPlan; version: number; savedAt: string | null };

const planView = (row: VisitPlanRow | null): PlanView =>
  row
    ? { plan: row.data, version: row.version, savedAt: row.updatedAt.toISOString() }
    : { plan: emptyVisitPlan(), version: 0, savedAt: null };

// Only the plan's own fields are kept, whatever else a client sends.
export function pickVisitPlan(body: VisitPlan): VisitPlan {
  return {
    structures: body.structures.map(({ key, kind, name, reachableInside, inScope, scopeNote }) => ({
      key,
      kind,
      name,
      reachableInside,
      inScope,
      scopeNote,
    })),
    cameraClass: body.cameraClass ?? null,
    conditions: { directSun: body.conditions.directSun, outdoorBlocked: body.conditions.outdoorBlocked },
    models: body.models.map(({ key, structureKeys, structure, structureNote, splitReason, splitNote }) => ({
      key,
      structureKeys,
      structure,
      structureNote,
      splitReason: splitReason ?? null,
      splitNote,
    })),
    modelsAccepted: body.modelsAccepted,
    startLevel: body.startLevel ?? null,
    units: body.units,
    rooms: body.rooms.map(({ key, name, level, lengthM, widthM }) => ({
      key,
      name,
      level,
      lengthM: lengthM ?? null,
      widthM: widthM ?? null,
    })),
    hazards: [...new Set(body.hazards)],
    kitTicked: [...new Set(body.kitTicked)],
    onSite: { arrivedAt: body.onSite.arrivedAt ?? null, leftAt: body.onSite.leftAt ?? null },
    notes: body.notes,
  };
}

// Cross-field rules the validator cannot see: models name structures of this plan, and
// leaving comes after arriving.
function assertConsistent(plan: VisitPlan) {
  const keys = new Set(plan.structures.map((s) => s.key));
  const fields: Record<string, string> = {};
  plan.models.forEach((model, i) => {
    if (model.structureKeys.some((k) => !keys.has(k))) fields[`models.${i}.structureKeys`] = 'Names a structure that is not in the plan';
  });
  const { arrivedAt, leftAt } = plan.onSite;
  if (arrivedAt && leftAt && Date.parse(leftAt) < Date.parse(arrivedAt)) fields['onSite.leftAt'] = 'Leaving must come after arriving';
  if (Object.keys(fields).length) throw invalid(fields);
}

export async function getPlan(actor: Actor, jobId: number): Promise<PlanView> {
  await findJobFor(actor, jobId);
  return planView(await VisitPlanRow.findByPk(jobId));
}

// The plan of a job without the access check, for services that already made it.
export async function planOfJob(jobId: number, transaction?: Transaction): Promise<VisitPlan | null> {
  return (await VisitPlanRow.findByPk(jobId, { transaction }))?.data ?? null;
}

export async function savePlan(actor: Actor, jobId: number, body: VisitPlan, baseVersion: number) {
  const plan = pickVisitPlan(body);
  assertConsistent(plan);
  return inTransaction(async (transaction) => {
    const job = await findJobFor(actor, jobId, { forUpdate: true, transaction });
    if (actor.role !== 'technician' || job.technicianId !== actor.id)
      throw forbidden('Only the technician assigned to this job can change its visit plan.');
    if (!EDITABLE_STATUSES.includes(job.status))
      throw conflict(`The visit plan cannot be changed while the job is "${JOB_STATUS_LABELS[job.status as JobStatus]}".`);
    const row = await VisitPlanRow.findByPk(jobId, { transaction, lock: transaction.LOCK.UPDATE });
    if ((row?.version ?? 0) !== baseVersion) throw staleVersion('This visit plan', planView(row));
    const settings = plan.cameraClass ? await settingsFor(plan.cameraClass, transaction) : null;
    const minutes = { plannedMinutes: visitEstimate(plan, settings).minutes, actualMinutes: minutesOnSite(plan.onSite) };
    const saved = row
      ? await row.set({ data: plan, version: row.version + 1, ...minutes }).save({ transaction })
      : await VisitPlanRow.create({ jobId, data: plan, ...minutes }, { transaction });
    return { version: saved.version, savedAt: saved.updatedAt.toISOString() };
  });
}

const settingsView = (row: CameraClassSetting): CameraClassSettings & { version: number } => ({
  cameraClass: row.cameraClass,
  kitItems: row.kitItems,
  minutesPerStation: row.minutesPerStation,
  setupMinutes: row.setupMinutes,
  version: row.version,
});

async function settingsFor(cameraClass: CameraClass, transaction?: Transaction): Promise<CameraClassSettings> {
  const row = await CameraClassSetting.findByPk(cameraClass, { transaction });
  return row ? settingsView(row) : DEFAULT_CAMERA_CLASS_SETTINGS[cameraClass];
}

// Every camera class, as a manager set it or else the defaults (version 0).
export async function listCameraClassSettings() {
  const rows = new Map((await CameraClassSetting.findAll()).map((r) => [r.cameraClass, r]));
  return CAMERA_CLASSES.map((c) => {
    const row = rows.get(c);
    return row ? settingsView(row) : { ...DEFAULT_CAMERA_CLASS_SETTINGS[c], version: 0 };
  });
}

export async function updateCameraClassSettings(
  actor: Actor,
  cameraClass: CameraClass,
  input: Pick<CameraClassSettings, 'kitItems' | 'minutesPerStation' | 'setupMinutes'>,
  baseVersion: number,
) {
  return inTransaction(async (transaction) => {
    const row = await CameraClassSetting.findByPk(cameraClass, { transaction, lock: transaction.LOCK.UPDATE });
    const current = row ? settingsView(row) : { ...DEFAULT_CAMERA_CLASS_SETTINGS[cameraClass], version: 0 };
    if (current.version !== baseVersion) throw staleVersion('These settings', current);
    const values = {
      kitItems: input.kitItems.map((item) => item.trim()),
      minutesPerStation: input.minutesPerStation ?? null,
      setupMinutes: input.setupMinutes,
      updatedById: actor.id,
    };
    const saved = row
      ? await row.set({ ...values, version: row.version + 1 }).save({ transaction })
      : await CameraClassSetting.create({ cameraClass, ...values }, { transaction });
    return settingsView(saved);
  });
}
