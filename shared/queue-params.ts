// The queue's filters and sort live in the URL; these turn them into the API's query string.
import { CAMERA_CLASSES } from './capture-record';
import { LOSS_TYPES, PRIORITIES } from './jobs';
import { QUEUE_SORTS, QUEUE_STATUSES } from './review';
import { SEARCH_MAX_LENGTH } from './search';

export const QUEUE_PARAM_KEYS = [
  'status',
  'technicianId',
  'lossType',
  'priority',
  'cameraClass',
  'submission',
  'claimedByMe',
  'q',
  'sort',
  'dir',
  'page',
] as const;
export type QueueParams = Partial<Record<(typeof QUEUE_PARAM_KEYS)[number], string>>;

const VALID: Partial<Record<keyof QueueParams, (v: string) => boolean>> = {
  status: (v) => v.split(',').every((s) => (QUEUE_STATUSES as string[]).includes(s)),
  technicianId: (v) => /^\d+$/.test(v),
  lossType: (v) => (LOSS_TYPES as readonly string[]).includes(v),
  priority: (v) => (PRIORITIES as readonly string[]).includes(v),
  cameraClass: (v) => (CAMERA_CLASSES as readonly string[]).includes(v),
  submission: (v) => v === 'first' || v === 'resubmission',
  claimedByMe: (v) => v === 'true',
  q: (v) => v.trim().length > 0 && v.length <= SEARCH_MAX_LENGTH,
  sort: (v) => (QUEUE_SORTS as readonly string[]).includes(v),
  dir: (v) => v === 'asc' || v === 'desc',
  page: (v) => /^[1-9]\d*$/.test(v),
};

// Keeps only known, well-formed parameters, in a stable order (a stable query key).
export function queueSearch(params: QueueParams, pageSize = 25): string {
  const parts: string[] = [];
  for (const key of QUEUE_PARAM_KEYS) {
    const value = params[key];
    if (value && VALID[key]?.(value)) parts.push(`${key}=${encodeURIComponent(value)}`);
  }
  parts.push(`pageSize=${pageSize}`);
  return parts.join('&');
}
