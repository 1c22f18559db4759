// One page of job ids in SQL, for the queue and the job list. Every offered order has an
// index whose leading columns are the filter (see the queue-and-job-list index migration),
// so a page reads its own rows plus the offset from the index and the rows are then fetched
// by primary key: no filesort over the queue, no table scan for the count.
import { QueryTypes } from 'sequelize';

import type { JobStatus } from '../../shared/jobs';
import { fullTextQuery, likePrefix, looksLikeClaimReference, searchTerms } from '../../shared/search';
import { sequelize } from '../db';

export type JobPageQuery = {
  conditions: string[];
  params: Record<string, unknown>;
  orderBy: string[]; // columns of jobs j, each with its direction
  limit: number;
  offset: number;
  search?: string;
  // Search the claim reference only (see resolveSearch).
  claimOnly?: boolean;
  // The index that serves this filter and order, named so the plan never depends on table
  // statistics (on a small or freshly loaded table MariaDB may otherwise choose a filesort).
  index?: string;
};

// Ids of the jobs a search matches: the claim reference from its start, or every word of
// the address and the technician's name from its start (full-text index).
function searchSource(search: string | undefined, params: Record<string, unknown>, claimOnly = false) {
  const terms = search ? searchTerms(search) : null;
  if (!terms) return null;
  params.searchPrefix = likePrefix(terms.referencePrefix);
  const fullText = claimOnly ? null : fullTextQuery(terms);
  if (!fullText) return 'SELECT id FROM jobs WHERE claim_reference LIKE :searchPrefix';
  params.searchWords = fullText;
  return `SELECT id FROM jobs WHERE claim_reference LIKE :searchPrefix
    UNION SELECT id FROM jobs WHERE MATCH(street, city, postcode, technician_name) AGAINST (:searchWords IN BOOLEAN MODE)`;
}

function fromAndWhere(q: Omit<JobPageQuery, 'orderBy' | 'limit' | 'offset'>, params: Record<string, unknown>, joins = '') {
  const matches = searchSource(q.search, params, q.claimOnly);
  const from = matches ? `(${matches}) s JOIN jobs j ON j.id = s.id` : `jobs j${q.index ? ` FORCE INDEX (${q.index})` : ''}`;
  const where = q.conditions.length ? `WHERE ${q.conditions.join(' AND ')}` : '';
  return `FROM ${from} ${joins} ${where}`;
}

// The page in one statement: the jobs' columns and whatever the joins add (the technician's
// and the claimant's names), read along the named index. `select` names columns of j and
// the joined tables; the default is the ids alone.
// A text that looks like a claim reference and starts one is searched as a claim reference
// only (one indexed prefix read decides); anything else also searches the words.
export async function resolveSearch<T extends { search?: string; claimOnly?: boolean }>(q: T): Promise<T> {
  if (!q.search || !looksLikeClaimReference(q.search)) return q;
  const hit = await sequelize.query('SELECT 1 FROM jobs WHERE claim_reference LIKE ? LIMIT 1', {
    replacements: [likePrefix(q.search.trim())],
    type: QueryTypes.SELECT,
  });
  return hit.length ? { ...q, claimOnly: true } : q;
}

export function pageSql(q: JobPageQuery, select = 'j.id', joins = '') {
  const params = { ...q.params, limit: q.limit, offset: q.offset };
  return { sql: `SELECT ${select} ${fromAndWhere(q, params, joins)} ORDER BY ${q.orderBy.join(', ')} LIMIT :limit OFFSET :offset`, params };
}

export async function pageOfJobs<T extends object>(q: JobPageQuery, select: string, joins: string): Promise<T[]> {
  const { sql, params } = pageSql(q, select, joins);
  return sequelize.query<T>(sql, { replacements: params, type: QueryTypes.SELECT });
}

// How many jobs match, counted from an index. With a cap, counting stops there: a list of
// every job a firm ever had needs "more than 10,000", not an exact figure at each page.
export async function countJobs(q: Pick<JobPageQuery, 'conditions' | 'params' | 'search' | 'claimOnly'>, cap?: number): Promise<number> {
  const params: Record<string, unknown> = { ...q.params, cap };
  const from = fromAndWhere({ conditions: q.conditions, params: q.params, search: q.search, claimOnly: q.claimOnly }, params);
  const sql = cap ? `SELECT COUNT(*) AS n FROM (SELECT 1 ${from} LIMIT :cap) capped` : `SELECT COUNT(*) AS n ${from}`;
  const [row] = await sequelize.query<{ n: number }>(sql, { replacements: params, type: QueryTypes.SELECT });
  return Number(row.n);
}

// Jobs per state, as the jobs triggers keep them (job_state_counts): a read of a few rows.
export async function stateCounts(states?: readonly JobStatus[]): Promise<Partial<Record<JobStatus, number>>> {
  const rows = await sequelize.query<{ status: JobStatus; n: number }>(
    `SELECT status, n FROM job_state_counts${states ? ' WHERE status IN (:states)' : ''}`,
    { replacements: { states: states ?? [] }, type: QueryTypes.SELECT },
  );
  return Object.fromEntries(rows.map((r) => [r.status, Number(r.n)]));
}

// Values as the mariadb driver returns them, in the API's shapes.
export const isoTime = (v: Date | string | null) => (v === null ? null : new Date(v).toISOString());
