// The station coordinate file a technician attaches to a capture record. Format (CSV, header
// row required, one row per station, columns in any order):
//   station  capture order number (1, 2, 3, …), unique
//   level    basement, crawl_space, ground, upper, attic or exterior
//   x, y     position on the level's plan
//   unit     ft or m (may differ between rows; everything is converted to metres)
//   room     optional room name, as in the capture record
//   kind     station (registered) or panorama (supplementary, not registered)
import Papa from 'papaparse';

import { RECORD_LIMITS } from './capture-limits';
import { LEVEL_KINDS, type LevelKind } from './capture-record';
import { type LengthUnit, toMetres } from './units';

export const STATION_KINDS = ['station', 'panorama'] as const;
export type StationKind = (typeof STATION_KINDS)[number];

export type StationPoint = { number: number; level: LevelKind; x: number; y: number; room: string | null; kind: StationKind };
export type FileProblem = { line: number; column: string; message: string };

const REQUIRED = ['station', 'level', 'x', 'y', 'unit', 'kind'] as const;

// A capture has at most this many stations (the record's own limit), and a file of that many
// rows is far below this size; anything larger is refused before it is parsed.
export const MAX_STATION_ROWS = RECORD_LIMITS.totalStations;
export const MAX_STATION_FILE_BYTES = 1024 * 1024;

export function parseStationFile(text: string): { stations: StationPoint[]; problems: FileProblem[] } {
  if (text.length > MAX_STATION_FILE_BYTES) {
    return {
      stations: [],
      problems: [{ line: 1, column: 'file', message: `A station file may be at most ${MAX_STATION_FILE_BYTES / 1024} KB` }],
    };
  }
  const parsed = Papa.parse<Record<string, string>>(text.replace(/^\uFEFF/, ''), {
    header: true,
    skipEmptyLines: 'greedy',
    transformHeader: (h) => h.trim().toLowerCase(),
  });
  const problems: FileProblem[] = [];
  const columns = parsed.meta.fields ?? [];
  for (const column of REQUIRED) {
    if (!columns.includes(column)) problems.push({ line: 1, column, message: `The header has no "${column}" column` });
  }
  if (problems.length) return { stations: [], problems };

  if (parsed.data.length > MAX_STATION_ROWS) {
    return {
      stations: [],
      problems: [
        {
          line: MAX_STATION_ROWS + 2,
          column: 'station',
          message: `A capture has at most ${MAX_STATION_ROWS} stations; this file has ${parsed.data.length} rows`,
        },
      ],
    };
  }
  const seen = new Map<number, number>();
  const stations: StationPoint[] = [];
  parsed.data.forEach((row, index) => {
    const line = index + 2; // line 1 is the header
    const value = (column: string) => (row[column] ?? '').trim();
    const rowProblems: FileProblem[] = [];
    const need = (column: string) => {
      if (!value(column)) rowProblems.push({ line, column, message: 'Missing value' });
      return value(column);
    };
    const numberIn = (column: string) => {
      const raw = need(column);
      if (!raw) return NaN;
      const n = Number(raw);
      if (!Number.isFinite(n)) rowProblems.push({ line, column, message: `Not a number: "${raw}"` });
      return n;
    };

    const stationRaw = need('station');
    const number = Number(stationRaw);
    if (stationRaw && (!Number.isInteger(number) || number < 1))
      rowProblems.push({ line, column: 'station', message: `Not a station number: "${stationRaw}"` });
    else if (stationRaw && seen.has(number))
      rowProblems.push({ line, column: 'station', message: `Duplicate station number ${number} (first on line ${seen.get(number)})` });
    const level = need('level');
    if (level && !(LEVEL_KINDS as readonly string[]).includes(level))
      rowProblems.push({ line, column: 'level', message: `Unknown level "${level}"` });
    const x = numberIn('x');
    const y = numberIn('y');
    const unit = need('unit');
    if (unit && unit !== 'ft' && unit !== 'm') rowProblems.push({ line, column: 'unit', message: `Unknown unit "${unit}" (use ft or m)` });
    const kind = need('kind');
    if (kind && !(STATION_KINDS as readonly string[]).includes(kind))
      rowProblems.push({ line, column: 'kind', message: `Unknown kind "${kind}" (use station or panorama)` });

    if (rowProblems.length) {
      problems.push(...rowProblems);
      return;
    }
    seen.set(number, line);
    stations.push({
      number,
      level: level as LevelKind,
      x: toMetres(x, unit as LengthUnit),
      y: toMetres(y, unit as LengthUnit),
      room: value('room') || null,
      kind: kind as StationKind,
    });
  });
  if (!problems.length && stations.length === 0) problems.push({ line: 2, column: 'station', message: 'The file has no stations' });
  return { stations: problems.length ? [] : stations, problems };
}
