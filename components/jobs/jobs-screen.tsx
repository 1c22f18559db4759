import { useLocalSearchParams, useRouter } from 'expo-router';
import { View } from 'react-native';

import { useJobsQuery } from '@/components/queries/jobs';
import { useSessionQuery } from '@/components/queries/session';
import { Button } from '@/components/ui/button';
import { Notice } from '@/components/ui/notice';
import { Screen } from '@/components/ui/screen';
import { Text } from '@/components/ui/text';
import { space } from '@/components/ui/theme';
import { JOB_STATUSES, type JobStatus } from '@/shared/jobs';

import { JobCard } from './job-card';
import { JobsTable } from './jobs-table';
import { StatusFilter } from './status-filter';

export function JobsScreen() {
  const { data: user } = useSessionQuery();
  const router = useRouter();
  const params = useLocalSearchParams<{ status?: string; technicianId?: string }>();
  // The filter lives in the URL so a reload or a shared link keeps it.
  const status = (JOB_STATUSES as readonly string[]).includes(params.status ?? '') ? (params.status as JobStatus) : null;
  const technicianId = /^\d+$/.test(params.technicianId ?? '') ? Number(params.technicianId) : undefined;
  const jobs = useJobsQuery({ status: status ? [status] : undefined, technicianId });
  const isTechnician = user?.role === 'technician';

  return (
    <Screen
      title={isTechnician ? 'My jobs' : 'Jobs'}
      subtitle={isTechnician ? 'Your assigned site visits, latest due date first' : 'Every job, by due date'}
      actions={isTechnician ? null : <Button label="New job" onPress={() => router.push('/jobs/new')} />}
    >
      <StatusFilter value={status} onChange={(s) => router.setParams({ status: s ?? '' })} />
      {jobs.error ? <Notice tone="error">{jobs.error.message}</Notice> : null}
      {jobs.isPending ? <Text variant="muted">Loading jobs…</Text> : null}
      {jobs.data && isTechnician ? (
        <View style={{ gap: space.md }}>
          {jobs.data.length === 0 ? <Text variant="muted">No jobs with this status.</Text> : null}
          {jobs.data.map((job) => (
            <JobCard key={job.id} job={job} />
          ))}
        </View>
      ) : null}
      {jobs.data && !isTechnician ? <JobsTable jobs={jobs.data} /> : null}
    </Screen>
  );
}
