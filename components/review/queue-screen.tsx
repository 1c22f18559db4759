import type { SortingState } from '@tanstack/react-table';
import { useLocalSearchParams, useRouter } from 'expo-router';
import { useMemo, useState } from 'react';
import { StyleSheet, useWindowDimensions, View } from 'react-native';

import { useKeyboard } from '@/components/lib/use-keyboard';
import { useRowSelection } from '@/components/lib/use-row-selection';
import { useClaimMutation } from '@/components/queries/claims';
import { useQueueQuery } from '@/components/queries/queue';
import { useSessionQuery } from '@/components/queries/session';
import { useTechniciansQuery } from '@/components/queries/technicians';
import { DisputesPanel } from '@/components/rework/disputes-panel';
import { Button } from '@/components/ui/button';
import { DataTable } from '@/components/ui/data-table';
import { HelpOverlay } from '@/components/ui/help-overlay';
import { Notice } from '@/components/ui/notice';
import { pageCount, Pager } from '@/components/ui/pager';
import { Screen } from '@/components/ui/screen';
import { selectColumn } from '@/components/ui/select-box';
import { Text } from '@/components/ui/text';
import { CARDS_BELOW, colors, space, WIDE_BREAKPOINT } from '@/components/ui/theme';
import { JOB_STATUS_LABELS } from '@/shared/jobs';
import { QUEUE_PARAM_KEYS, type QueueParams, queueSearch } from '@/shared/queue-params';
import type { QueueRow, QueueSort } from '@/shared/review';

import { MoveClaims } from './move-claims';
import { QUEUE_HIDDEN_BY_DEFAULT, queueColumns } from './queue-columns';
import { QueueFilters } from './queue-filters';
import { ReassignPanel } from './reassign-panel';
import { SecondReviewList } from './second-review-list';

const KEYS = [
  { keys: '↓ or j', action: 'Next row' },
  { keys: '↑ or k', action: 'Previous row' },
  { keys: 'Enter', action: 'Open the selected job' },
  { keys: 'c', action: 'Claim the selected job and open it' },
  { keys: '] / [', action: 'Next / previous page' },
  { keys: '?', action: 'Show or hide these keys' },
];

export function QueueScreen() {
  const router = useRouter();
  const { data: me } = useSessionQuery();
  const raw = useLocalSearchParams<QueueParams>();
  const params = useMemo(
    () => Object.fromEntries(QUEUE_PARAM_KEYS.map((k) => [k, typeof raw[k] === 'string' ? raw[k] : ''])) as QueueParams,
    [raw],
  );
  const search = queueSearch(params);
  const queue = useQueueQuery(search);
  const technicians = useTechniciansQuery();
  const claim = useClaimMutation();
  const [selected, setSelected] = useState(0);
  const [help, setHelp] = useState(false);
  const isReviewer = me?.role === 'reviewer';
  const wide = useWindowDimensions().width >= WIDE_BREAKPOINT;

  const rows = useMemo(() => queue.data?.rows ?? [], [queue.data]);
  const page = queue.data?.page ?? 1;
  const pages = queue.data ? pageCount(queue.data.total, queue.data.pageSize) : 1;
  const setParams = (changes: QueueParams) => router.setParams(changes as never);
  // The review screen keeps the filter it came from, for "Claim next" after the decision.
  const open = (row: QueueRow | undefined) =>
    row && router.push(`/queue/${row.id}?from=${encodeURIComponent(queueSearch(params))}` as never);
  const claimAndOpen = async (row: QueueRow | undefined) => {
    if (!row || !isReviewer) return;
    await claim
      .mutateAsync(row.id)
      .then(() => open(row))
      .catch(() => undefined);
  };

  useKeyboard(
    {
      ArrowDown: (e) => {
        e.preventDefault();
        setSelected((i) => Math.min(i + 1, rows.length - 1));
      },
      j: () => setSelected((i) => Math.min(i + 1, rows.length - 1)),
      ArrowUp: (e) => {
        e.preventDefault();
        setSelected((i) => Math.max(i - 1, 0));
      },
      k: () => setSelected((i) => Math.max(i - 1, 0)),
      Enter: () => open(rows[selected]),
      c: () => void claimAndOpen(rows[selected]),
      ']': () => page < pages && setParams({ page: String(page + 1) }),
      '[': () => page > 1 && setParams({ page: String(page - 1) }),
      '?': () => setHelp((h) => !h),
    },
    !help,
  );

  const sorting: SortingState = params.sort ? [{ id: params.sort === 'claim' ? 'claim' : params.sort, desc: params.dir === 'desc' }] : [];
  // Due times are shown relative to when the page was fetched.
  const fetchedAt = queue.dataUpdatedAt;
  const manager = me?.role === 'manager';
  const ids = useMemo(() => rows.map((r) => r.id), [rows]);
  const picked = useRowSelection(ids);
  const columns = useMemo(() => {
    const base = queueColumns(new Date(fetchedAt), me?.id);
    if (!manager) return base;
    // Managers tick records to give them to a reviewer together.
    return [selectColumn<QueueRow>(picked.selected, picked.toggle), ...base];
  }, [me?.id, fetchedAt, manager, picked.selected, picked.toggle]);
  const counts = queue.data?.counts ?? {};

  return (
    <Screen
      title="Queue"
      subtitle="Capture records waiting for review, by due time (overdue first), then priority."
      actions={wide ? <Button label="Keyboard keys (?)" tone="secondary" onPress={() => setHelp(true)} /> : null}
    >
      <Text role="status">
        {(['submitted', 'resubmitted', 'in_review', 'rework_requested'] as const)
          .map((s) => `${JOB_STATUS_LABELS[s]}: ${counts[s] ?? 0}`)
          .join(' · ')}
      </Text>
      <QueueFilters params={params} technicians={technicians.data ?? []} onChange={setParams} />
      {queue.error ? <Notice tone="error">{queue.error.message}</Notice> : null}
      {claim.error ? <Notice tone="error">{claim.error.message}</Notice> : null}
      {manager ? <MoveClaims selected={picked.selected} onClear={() => picked.setSelected([])} /> : null}
      <DataTable
        label="Review queue"
        columns={columns}
        data={rows}
        emptyText={queue.isPending ? 'Loading the queue…' : 'Nothing waiting with these filters.'}
        getRowId={(r) => String(r.id)}
        onRowPress={open}
        onRowFocus={(row) => setSelected(Math.max(rows.indexOf(row), 0))}
        selectedRowId={rows[selected] ? String(rows[selected].id) : null}
        sorting={sorting}
        onSortingChange={(next) =>
          setParams({ sort: (next[0]?.id as QueueSort | undefined) ?? '', dir: next[0]?.desc ? 'desc' : 'asc', page: '' })
        }
        cardsBelow={CARDS_BELOW}
        rowLabel={(r) => r.claimReference}
        columnChoice={{
          storageKey: 'queue',
          // A manager's queue has the tick-box column too: Loss makes room for it at 1440 px.
          hiddenByDefault: manager ? [...QUEUE_HIDDEN_BY_DEFAULT, 'lossType'] : QUEUE_HIDDEN_BY_DEFAULT,
        }}
      />
      <Pager
        page={page}
        pageSize={queue.data?.pageSize ?? 25}
        total={queue.data?.total ?? 0}
        noun="jobs"
        onPage={(p) => setParams({ page: String(p) })}
      />
      {isReviewer && rows[selected] ? (
        <View style={styles.selectedBar}>
          <Text>{`Selected: ${rows[selected].claimReference}`}</Text>
          <Button
            label={`Claim ${rows[selected].claimReference}`}
            onPress={() => void claimAndOpen(rows[selected])}
            busy={claim.isPending}
          />
        </View>
      ) : null}
      {isReviewer ? <SecondReviewList /> : null}
      {me?.role === 'manager' ? <DisputesPanel /> : null}
      {manager ? <ReassignPanel /> : null}
      <HelpOverlay visible={help} title="Queue keys" keys={KEYS} onClose={() => setHelp(false)} />
    </Screen>
  );
}

const styles = StyleSheet.create({
  selectedBar: {
    flexDirection: 'row',
    alignItems: 'center',
    gap: space.md,
    flexWrap: 'wrap',
    borderTopWidth: 1,
    borderTopColor: colors.line,
    paddingTop: space.md,
  },
});
