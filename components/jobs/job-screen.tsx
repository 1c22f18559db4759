import { useState } from 'react';
import { Pressable, StyleSheet, View } from 'react-native';

import { CaptureRecordForm } from '@/components/capture-record/capture-record-form';
import { FilesSection } from '@/components/capture-record/files-section';
import { FindingsPanel } from '@/components/capture-record/findings-panel';
import { formatDate, formatDateTime } from '@/components/lib/format';
import { lazyView } from '@/components/lib/lazy-view';
import { useJobQuery, useRevisionQuery } from '@/components/queries/jobs';
import { useSessionQuery } from '@/components/queries/session';
import { ReworkChecklist } from '@/components/rework/rework-checklist';
import { Timeline } from '@/components/rework/timeline';
import { Notice } from '@/components/ui/notice';
import { Screen } from '@/components/ui/screen';
import { Text } from '@/components/ui/text';
import { colors, fonts, space } from '@/components/ui/theme';
import { PlanCard } from '@/components/visit-plan/plan-card';
import { useLatestPlan } from '@/components/visit-plan/use-latest-plan';
import { EDITABLE_STATUSES, JOB_STATUS_LABELS, LOSS_TYPE_LABELS, PRIORITY_LABELS, PROPERTY_TYPE_LABELS } from '@/shared/jobs';

import { AssignmentPanel } from './assignment-panel';
import { ContactsCard } from './contacts-card';
import { DeliveryPanel } from './delivery-panel';
import { DueText } from './due-text';
import { RecordView } from './record-view';
import { StatusBadge } from './status-badge';

const StationSection = lazyView(() => import('@/components/stations/station-section').then((m) => m.StationSection), 'the station plan');

export function JobScreen({ id }: { id: number }) {
  const { data: user } = useSessionQuery();
  const query = useJobQuery(id);
  const latest = query.data?.revisions.at(-1)?.number ?? null;
  const [chosen, setChosen] = useState<number | null>(null);
  const shown = chosen ?? latest;
  const revision = useRevisionQuery(id, shown);
  const plan = useLatestPlan(id, user?.id ?? null);

  if (query.error)
    return (
      <Screen title="Job">
        <Notice tone="error">{query.error.message}</Notice>
      </Screen>
    );
  if (!query.data)
    return (
      <Screen title="Job">
        <Text variant="muted">Loading…</Text>
      </Screen>
    );

  const { job } = query.data;
  const canEdit = user?.role === 'technician' && user.id === job.technician.id && EDITABLE_STATUSES.includes(job.status);

  return (
    <Screen title={`Job ${job.claimReference}`} subtitle={`${job.street}, ${job.city} ${job.postcode}`}>
      <View style={styles.header}>
        <StatusBadge status={job.status} />
        <DueText job={job} />
        <Text variant="small">{`${LOSS_TYPE_LABELS[job.lossType]} loss on ${formatDate(job.lossDate)} · ${PROPERTY_TYPE_LABELS[job.propertyType]} · ${PRIORITY_LABELS[job.priority]} priority`}</Text>
        <Text variant="small">{`Site visit ${formatDate(job.siteVisitDate)} · Technician ${job.technician.name}`}</Text>
      </View>

      <ContactsCard job={job} contacts={query.data.contacts} canEdit={user?.role === 'manager' || user?.role === 'admin'} />
      {user?.role === 'manager' || user?.role === 'admin' ? <AssignmentPanel job={job} /> : null}
      {(user?.role === 'manager' || user?.role === 'admin') && job.status === 'accepted' ? (
        <DeliveryPanel jobId={job.id} canChange={user.role === 'manager'} hasAdjusterEmail={Boolean(query.data.contacts.adjusterEmail)} />
      ) : null}
      {job.status === 'rework_requested' || (latest !== null && latest > 1) ? (
        <ReworkChecklist
          jobId={job.id}
          status={job.status}
          editable={canEdit && job.status === 'rework_requested'}
          files={query.data.files}
        />
      ) : null}
      <PlanCard jobId={job.id} plan={plan.plan} canPlan={canEdit} />
      {canEdit && !plan.ready ? <Text variant="muted">Loading the visit plan…</Text> : null}
      {canEdit ? (
        plan.ready ? (
          <CaptureRecordForm key={job.id} detail={query.data} userId={user.id} plan={plan.plan} />
        ) : null
      ) : (
        <View style={{ gap: space.md }}>
          {latest === null ? (
            <Notice tone="info">No capture record has been submitted for this job yet.</Notice>
          ) : (
            <>
              <Notice tone="info">{`${JOB_STATUS_LABELS[job.status]}. Latest: revision ${latest}, submitted ${formatDateTime(query.data.revisions.at(-1)!.submittedAt)}.`}</Notice>
              <View style={styles.revisions} role="tablist" aria-label="Revisions">
                {query.data.revisions.map((r) => (
                  <Pressable
                    key={r.number}
                    role="tab"
                    aria-selected={r.number === shown}
                    onPress={() => setChosen(r.number)}
                    style={[styles.tab, r.number === shown && styles.tabSelected]}
                  >
                    <Text
                      style={{ fontFamily: fonts.semibold, color: r.number === shown ? colors.surface : colors.ink }}
                    >{`Revision ${r.number}`}</Text>
                  </Pressable>
                ))}
              </View>
              {revision.data ? (
                <View style={styles.card}>
                  <RecordView record={revision.data.record} />
                  <FindingsPanel findings={revision.data.findings} />
                </View>
              ) : null}
              {revision.data ? (
                <StationSection
                  jobId={job.id}
                  revision={revision.data.number}
                  hasFile={revision.data.files.some((f) => f.kind === 'station_coordinates')}
                />
              ) : null}
            </>
          )}
          <FilesSection jobId={job.id} files={query.data.files} editable={false} />
        </View>
      )}
      <Timeline jobId={job.id} />
    </Screen>
  );
}

const styles = StyleSheet.create({
  header: { gap: space.xs, backgroundColor: colors.surface, borderWidth: 1, borderColor: colors.line, borderRadius: 8, padding: space.lg },
  card: { backgroundColor: colors.surface, borderWidth: 1, borderColor: colors.line, borderRadius: 8, padding: space.lg, gap: space.md },
  revisions: { flexDirection: 'row', gap: space.sm, flexWrap: 'wrap' },
  tab: { borderWidth: 1, borderColor: colors.ink, borderRadius: 6, paddingHorizontal: space.md, paddingVertical: 6 },
  tabSelected: { backgroundColor: colors.ink },
});
