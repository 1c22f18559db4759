import { type CaptureRecord, roomAreaM2 } from '../../shared/capture-record';
import { analyseStations, type StationAnalysis } from '../../shared/station-analysis';
import { type FileProblem, parseStationFile } from '../../shared/station-file';
import { config } from '../config';
import { HttpError, invalid, notFound } from '../errors';
import { CaptureDraft, CaptureRevision, StoredFile } from '../models';
import { getObjectStream } from '../storage/s3';
import { findJobFor } from './job-access';

type Actor = Express.User;

// Refuses a station file with any bad row, naming lines and columns (first few in the field).
export function assertValidStationFile(buffer: Buffer) {
  const { problems } = parseStationFile(buffer.toString('utf8'));
  if (problems.length) {
    const listed = problems
      .slice(0, 8)
      .map((p: FileProblem) => `line ${p.line}, ${p.column}: ${p.message}`)
      .join('; ');
    throw invalid({ file: `The station file has ${problems.length} problem(s): ${listed}${problems.length > 8 ? '; …' : ''}` });
  }
}

async function readText(storageKey: string) {
  try {
    const stream = await getObjectStream(storageKey);
    const chunks: Buffer[] = [];
    for await (const chunk of stream) chunks.push(Buffer.from(chunk as Uint8Array));
    return Buffer.concat(chunks).toString('utf8');
  } catch {
    throw new HttpError(503, 'storage_unavailable', 'File storage cannot be reached right now. Please try again.');
  }
}

export function analyseFor(record: CaptureRecord, text: string): StationAnalysis {
  const { stations } = parseStationFile(text);
  return analyseStations(stations, {
    maxSpacingM: record.cameraClass ? config.stationSpacingM[record.cameraClass] : null,
    outdoorMaxSpacingM: record.cameraClass ? config.outdoorStationSpacingM[record.cameraClass] : null,
    rooms: record.rooms.map((r) => ({ name: r.name, areaM2: roomAreaM2(r) })),
  });
}

// The newest station file attached to the job's working record, analysed against a record.
// Reads object storage: never call it inside a database transaction.
export async function analyseAttachedFile(jobId: number, record: CaptureRecord): Promise<StationAnalysis | null> {
  const file = await StoredFile.findOne({
    where: { jobId, kind: 'station_coordinates', detachedAt: null },
    order: [['id', 'DESC']],
  });
  if (!file) return null;
  return analyseFor(record, await readText(file.storageKey));
}

export async function stationAnalysisFor(actor: Actor, jobId: number, revision: number | null) {
  await findJobFor(actor, jobId);
  if (revision !== null) {
    const row = await CaptureRevision.findOne({ where: { jobId, number: revision } });
    if (!row) throw notFound('Revision');
    return { analysis: row.stationAnalysis, units: row.data.units };
  }
  const draft = await CaptureDraft.findByPk(jobId);
  if (!draft) throw notFound('Capture record');
  return { analysis: await analyseAttachedFile(jobId, draft.data), units: draft.data.units };
}
