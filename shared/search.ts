// One search box for jobs: a claim reference typed from its start ("MRK-26-04"), or words
// of the address or the technician's name, each matched from its start ("ald row" finds
// "12 Alder Row"). Words shorter than three letters are left out of the word search, as
// the database's full-text index does not keep them.
export const SEARCH_MAX_LENGTH = 80;
const MIN_WORD = 3;

export type SearchTerms = { referencePrefix: string; words: string[] };

export function searchTerms(query: string): SearchTerms | null {
  const trimmed = query.trim().slice(0, SEARCH_MAX_LENGTH);
  if (!trimmed) return null;
  const words = trimmed.split(/[^\p{L}\p{N}]+/u).filter((w) => w.length >= MIN_WORD);
  return { referencePrefix: trimmed, words };
}

// MariaDB boolean-mode full-text query: every word required, each as a prefix.
export function fullTextQuery(terms: SearchTerms): string | null {
  return terms.words.length ? terms.words.map((w) => `+${w}*`).join(' ') : null;
}

// LIKE pattern for "starts with", with the wildcard characters escaped.
export function likePrefix(text: string): string {
  return `${text.replace(/[\\%_]/g, (c) => `\\${c}`)}%`;
}

// A claim reference typed whole or in part ("MRK-26-04", "0421"): one token with a digit.
// When such a text starts a claim reference, the word search is skipped: the office has the
// claim number, and a full-text prefix search costs tens of milliseconds even with no match.
export function looksLikeClaimReference(text: string): boolean {
  const t = text.trim();
  return /^[\p{L}\p{N}-]+$/u.test(t) && /\d/.test(t);
}
