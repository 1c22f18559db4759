import { useLocalSearchParams, useRouter } from 'expo-router';
import { View } from 'react-native';

import { jobIdsInFilter, useJobsQuery } from '@/components/queries/jobs';
import { useSessionQuery } from '@/components/queries/session';
import { Button } from '@/components/ui/button';
import { Notice } from '@/components/ui/notice';
import { Pager } from '@/components/ui/pager';
import { Screen } from '@/components/ui/screen';
import { SearchBox } from '@/components/ui/search-box';
import { Text } from '@/components/ui/text';
import { space } from '@/components/ui/theme';
import { JOB_SORTS, JOB_STATUSES, type JobSort, type JobStatus } from '@/shared/jobs';

import { JobCard } from './job-card';
import { JobsTable } from './jobs-table';
import { StatusFilter } from './status-filter';

type Params = { status?: string; technicianId?: string; q?: string; sort?: string; dir?: string; page?: string };

export function JobsScreen() {
  const { data: user } = useSessionQuery();
  const router = useRouter();
  const params = useLocalSearchParams<Params>();
  // Filters, search, sort and page live in the URL so a reload or a shared link keeps them.
  const status = (JOB_STATUSES as readonly string[]).includes(params.status ?? '') ? (params.status as JobStatus) : null;
  const technicianId = /^\d+$/.test(params.technicianId ?? '') ? Number(params.technicianId) : undefined;
  const sort = (JOB_SORTS as readonly string[]).includes(params.sort ?? '') ? (params.sort as JobSort) : undefined;
  const dir = params.dir === 'asc' || params.dir === 'desc' ? params.dir : undefined;
  const page = /^[1-9]\d*$/.test(params.page ?? '') ? Number(params.page) : 1;
  const q = typeof params.q === 'string' ? params.q : '';
  const jobs = useJobsQuery({ status: status ? [status] : undefined, technicianId, q: q || undefined, sort, dir, page, pageSize: 50 });
  const isTechnician = user?.role === 'technician';
  const setParams = (changes: Params) => router.setParams(changes as never);
  const list = jobs.data?.jobs;

  return (
    <Screen
      title={isTechnician ? 'My jobs' : 'Jobs'}
      subtitle={isTechnician ? 'Your assigned site visits, latest due date first' : 'Every job, latest due date first'}
      actions={isTechnician ? null : <Button label="New job" onPress={() => router.push('/jobs/new')} />}
    >
      <View style={{ gap: space.md }}>
        <SearchBox label="Search claim, address or technician" value={q} onSearch={(text) => setParams({ q: text, page: '' })} />
        <StatusFilter value={status} onChange={(s) => setParams({ status: s ?? '', page: '' })} />
      </View>
      {jobs.error ? <Notice tone="error">{jobs.error.message}</Notice> : null}
      {jobs.isPending ? <Text variant="muted">Loading jobs…</Text> : null}
      {list && isTechnician ? (
        <View style={{ gap: space.md }}>
          {list.length === 0 ? <Text variant="muted">No jobs match.</Text> : null}
          {list.map((job) => (
            <JobCard key={job.id} job={job} />
          ))}
        </View>
      ) : null}
      {list && !isTechnician ? (
        <JobsTable
          jobs={list}
          sort={sort}
          dir={dir}
          onSort={(next) => setParams({ sort: next?.sort ?? '', dir: next?.dir ?? '', page: '' })}
          selectable={user?.role === 'manager' || user?.role === 'admin'}
          filterTotal={jobs.data?.totalIsAtLeast ? Number.MAX_SAFE_INTEGER : (jobs.data?.total ?? 0)}
          idsInFilter={() => jobIdsInFilter({ status: status ? [status] : undefined, technicianId, q: q || undefined, sort, dir })}
        />
      ) : null}
      {jobs.data && jobs.data.total > jobs.data.pageSize ? (
        <Pager
          page={jobs.data.page}
          pageSize={jobs.data.pageSize}
          total={jobs.data.total}
          noun="jobs"
          onPage={(p) => setParams({ page: String(p) })}
        />
      ) : null}
    </Screen>
  );
}
