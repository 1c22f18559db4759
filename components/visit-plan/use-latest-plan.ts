// The newest plan this device knows for a job: edits kept on the phone and not yet sent win
// over the server's copy, so a record opened offline right after planning is filled from them.
import { useEffect, useState } from 'react';

import { deviceKey, readDevice } from '@/components/device/device-store';
import type { LocalDraft } from '@/components/device/use-draft-sync';
import { usePlanQuery } from '@/components/queries/visit-plan';
import type { VisitPlan } from '@/shared/visit-plan';

import { type PlanValues, toPlan } from './plan-values';

export function useLatestPlan(jobId: number, userId: number | null) {
  const query = usePlanQuery(jobId);
  const [local, setLocal] = useState<VisitPlan | null | undefined>(undefined);
  useEffect(() => {
    if (userId === null) return;
    let cancelled = false;
    void readDevice<LocalDraft<PlanValues>>(deviceKey.plan(userId, jobId)).then((kept) => {
      if (!cancelled) setLocal(kept && kept.changes > 0 ? toPlan(kept.values).plan : null);
    });
    return () => {
      cancelled = true;
    };
  }, [jobId, userId]);
  const server = query.data && query.data.version > 0 ? query.data.plan : null;
  return {
    ready: local !== undefined && (query.isFetchedAfterMount || query.isError),
    plan: local ?? server,
    version: query.data?.version ?? 0,
  };
}
