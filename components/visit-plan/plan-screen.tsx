// The visit plan page: the assigned technician plans (and re-plans during rework); everyone
// else who reads the job reads the plan.
import { formatDate } from '@/components/lib/format';
import { useJobQuery } from '@/components/queries/jobs';
import { useSessionQuery } from '@/components/queries/session';
import { useCameraClassesQuery, usePlanQuery } from '@/components/queries/visit-plan';
import { Notice } from '@/components/ui/notice';
import { Screen } from '@/components/ui/screen';
import { Text } from '@/components/ui/text';
import { EDITABLE_STATUSES } from '@/shared/jobs';

import { PlanEditor } from './plan-editor';
import { PlanSummary } from './plan-summary';

export function PlanScreen({ id }: { id: number }) {
  const { data: user } = useSessionQuery();
  const job = useJobQuery(id);
  const plan = usePlanQuery(id);
  const classes = useCameraClassesQuery();
  const error = job.error ?? plan.error ?? classes.error;
  if (error)
    return (
      <Screen title="Visit plan">
        <Notice tone="error">{error.message}</Notice>
      </Screen>
    );
  // The editor starts from the server's version, so it waits for this visit's answer (or the
  // device's copy when offline), never a cached one from earlier.
  if (!job.data || !plan.data || !plan.isFetchedAfterMount || !classes.data || !user)
    return (
      <Screen title="Visit plan">
        <Text variant="muted">Loading…</Text>
      </Screen>
    );
  const detail = job.data.job;
  const editable = user.role === 'technician' && user.id === detail.technician.id && EDITABLE_STATUSES.includes(detail.status);
  const settings = classes.data.find((c) => c.cameraClass === plan.data.plan.cameraClass) ?? null;
  return (
    <Screen
      title={`Visit plan · ${detail.claimReference}`}
      subtitle={`${detail.street}, ${detail.city} · site visit ${formatDate(detail.siteVisitDate)}`}
    >
      {editable ? (
        <PlanEditor
          jobId={id}
          userId={user.id}
          lossType={detail.lossType}
          accessNotes={job.data.contacts.accessNotes}
          server={plan.data}
          settings={classes.data}
        />
      ) : plan.data.version === 0 ? (
        <Notice tone="info">No visit plan was made for this job.</Notice>
      ) : (
        <PlanSummary plan={plan.data.plan} settings={settings} />
      )}
    </Screen>
  );
}
