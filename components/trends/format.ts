import type { Interval } from '@/shared/statistics';

export const formatRate = (v: number | null | undefined) => (v === null || v === undefined ? '–' : `${Math.round(v * 100)} %`);

export const intervalText = (i: Interval | null) => (i ? `${Math.round(i.low * 100)}–${Math.round(i.high * 100)} %` : '–');
