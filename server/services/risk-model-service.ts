// The rework-risk model: fitted from past first reviews by whichever instance takes the named
// lock (the others skip), stored as a new version, read by everyone.
import { QueryTypes, type Transaction } from 'sequelize';

import type { CaptureRecord } from '../../shared/capture-record';
import type { LossType, PropertyType } from '../../shared/jobs';
import { QUEUE_STATUSES } from '../../shared/review';
import { riskFacts } from '../../shared/risk-facts';
import { fitRiskModel, type TrainingRow } from '../../shared/risk-fit';
import { type RiskModelView, riskProbability } from '../../shared/risk-hint';
import type { StationAnalysis } from '../../shared/station-analysis';
import { config } from '../config';
import { sequelize } from '../db';
import { RiskModel } from '../models';
import { parseJson } from '../models/columns';

type Row = {
  decision: string;
  decided_at: Date | null;
  number: number;
  data: CaptureRecord | string;
  station_analysis: StationAnalysis | string | null;
  loss_type: LossType;
  property_type: PropertyType;
};

// Each revision's first review: rework or recapture means it came back.
const TRAINING_SQL = `
  SELECT r.decision, r.decided_at, cr.number, cr.data, cr.station_analysis, j.loss_type, j.property_type
  FROM (SELECT MIN(id) AS id FROM reviews WHERE kind = 'primary' GROUP BY job_id, revision_number) f
  JOIN reviews r ON r.id = f.id
  JOIN capture_revisions cr ON cr.job_id = r.job_id AND cr.number = r.revision_number
  JOIN jobs j ON j.id = r.job_id`;

function toTrainingRow(row: Row): TrainingRow {
  const analysis = row.station_analysis === null ? null : parseJson(row.station_analysis);
  return {
    facts: riskFacts(parseJson(row.data), analysis, { lossType: row.loss_type, propertyType: row.property_type }, row.number),
    cameBack: row.decision === 'accept' ? 0 : 1,
    decidedAt: row.decided_at ? new Date(row.decided_at).toISOString() : '',
  };
}

export async function latestRiskModel(): Promise<RiskModelView | null> {
  return (await RiskModel.findOne({ order: [['version', 'DESC']] }))?.toView() ?? null;
}

// The probability for one record under the model in use; null while the model is withheld.
export async function riskOfRecord(
  record: CaptureRecord,
  analysis: StationAnalysis | null,
  job: { lossType: LossType; propertyType: PropertyType },
  revision: number,
  transaction?: Transaction,
): Promise<number | null> {
  const model = (await RiskModel.findOne({ order: [['version', 'DESC']], transaction }))?.toView() ?? null;
  return riskProbability(model, riskFacts(record, analysis, job, revision));
}

// After a fit, every record in the queue is scored again by the new model (null if withheld),
// a chunk of jobs per statement.
export async function rescoreQueue(model: RiskModelView | null, transaction?: Transaction) {
  const rows = await sequelize.query<Row & { id: number }>(
    `SELECT j.id, j.loss_type, j.property_type, cr.number, cr.data, cr.station_analysis, '' AS decision, NULL AS decided_at
     FROM jobs j JOIN capture_revisions cr ON cr.job_id = j.id AND cr.number = j.current_revision
     WHERE j.status IN (:statuses)`,
    { replacements: { statuses: QUEUE_STATUSES }, type: QueryTypes.SELECT, transaction },
  );
  for (let i = 0; i < rows.length; i += 200) {
    const chunk = rows.slice(i, i + 200).map((row) => ({
      id: Number(row.id),
      p: riskProbability(model, toTrainingRow(row).facts),
    }));
    const cases = chunk.map((c) => `WHEN ${c.id} THEN ${c.p === null ? 'NULL' : c.p.toFixed(5)}`).join(' ');
    await sequelize.query(`UPDATE jobs SET risk_probability = CASE id ${cases} END WHERE id IN (:ids)`, {
      replacements: { ids: chunk.map((c) => c.id) },
      type: QueryTypes.UPDATE,
      transaction,
    });
  }
  return rows.length;
}

// Fits and stores a new version; null when another instance is fitting right now.
export async function fitAndStoreRiskModel(): Promise<RiskModelView | null> {
  return sequelize.transaction(async (transaction) => {
    const [lock] = await sequelize.query<{ got: number | null }>("SELECT GET_LOCK('sightline_risk_fit', 0) AS got", {
      type: QueryTypes.SELECT,
      transaction,
    });
    if (!Number(lock.got)) return null;
    try {
      const rows = await sequelize.query<Row>(TRAINING_SQL, { type: QueryTypes.SELECT, transaction });
      const fit = fitRiskModel(rows.map(toTrainingRow), { minReviews: config.risk.minReviews });
      const saved = (await RiskModel.create({ ...fit, fittedAt: new Date() }, { transaction })).toView();
      await rescoreQueue(saved, transaction);
      return saved;
    } finally {
      await sequelize.query("SELECT RELEASE_LOCK('sightline_risk_fit')", { type: QueryTypes.SELECT, transaction });
    }
  });
}

// The scheduled refit: only when the newest model is older than the interval.
export async function refitRiskModelIfDue(now = new Date()) {
  if (config.risk.fitIntervalMs <= 0) return null;
  const latest = await RiskModel.findOne({ order: [['version', 'DESC']], attributes: ['fittedAt'] });
  if (latest && now.getTime() - latest.fittedAt.getTime() < config.risk.fitIntervalMs) return null;
  return fitAndStoreRiskModel();
}
