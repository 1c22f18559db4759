import { StyleSheet, View } from 'react-native';

import { SearchBox } from '@/components/ui/search-box';
import { Select } from '@/components/ui/select';
import { space } from '@/components/ui/theme';
import { CAMERA_CLASS_LABELS, CAMERA_CLASSES } from '@/shared/capture-record';
import { JOB_STATUS_LABELS, LOSS_TYPE_LABELS, LOSS_TYPES, PRIORITIES, PRIORITY_LABELS } from '@/shared/jobs';
import type { QueueParams } from '@/shared/queue-params';
import { QUEUE_STATUSES } from '@/shared/review';

const opts = <T extends string>(values: readonly T[], labels: Record<T, string>) =>
  values.map((value) => ({ value, label: labels[value] }));

export function QueueFilters({
  params,
  technicians,
  onChange,
}: {
  params: QueueParams;
  technicians: { id: number; name: string }[];
  onChange: (changes: QueueParams) => void;
}) {
  const set = (key: keyof QueueParams) => (value: string) => onChange({ [key]: value, page: '' });
  return (
    <View style={styles.bar} role="group" aria-label="Queue filters">
      <SearchBox label="Search claim, address or technician" value={params.q ?? ''} onSearch={(q) => onChange({ q, page: '' })} />
      <Select
        label="Status"
        value={params.status ?? ''}
        options={opts(QUEUE_STATUSES, JOB_STATUS_LABELS)}
        onChange={set('status')}
        allLabel="Waiting for review"
      />
      <Select
        label="Technician"
        value={params.technicianId ?? ''}
        options={technicians.map((t) => ({ value: String(t.id), label: t.name }))}
        onChange={set('technicianId')}
      />
      <Select label="Loss type" value={params.lossType ?? ''} options={opts(LOSS_TYPES, LOSS_TYPE_LABELS)} onChange={set('lossType')} />
      <Select label="Priority" value={params.priority ?? ''} options={opts(PRIORITIES, PRIORITY_LABELS)} onChange={set('priority')} />
      <Select
        label="Camera"
        value={params.cameraClass ?? ''}
        options={opts(CAMERA_CLASSES, CAMERA_CLASS_LABELS)}
        onChange={set('cameraClass')}
      />
      <Select
        label="Submission"
        value={params.submission ?? ''}
        options={[
          { value: 'first', label: 'First submission' },
          { value: 'resubmission', label: 'Resubmission' },
        ]}
        onChange={set('submission')}
      />
      <Select
        label="Claimed"
        value={params.claimedByMe ?? ''}
        options={[{ value: 'true', label: 'Claimed by me' }]}
        onChange={set('claimedByMe')}
        allLabel="Anyone"
      />
    </View>
  );
}

const styles = StyleSheet.create({ bar: { flexDirection: 'row', flexWrap: 'wrap', gap: space.md } });
