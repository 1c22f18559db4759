import { useState } from 'react';
import { StyleSheet, View } from 'react-native';

import { useJobUpdateMutation } from '@/components/queries/jobs';
import { useTechniciansQuery } from '@/components/queries/technicians';
import { Button } from '@/components/ui/button';
import { Notice } from '@/components/ui/notice';
import { Select } from '@/components/ui/select';
import { colors, space } from '@/components/ui/theme';
import type { JobSummary } from '@/shared/jobs';

// Managers and admins move a job to another technician (recorded on the timeline).
export function AssignmentPanel({ job }: { job: JobSummary }) {
  const technicians = useTechniciansQuery();
  const update = useJobUpdateMutation(job.id);
  const [technicianId, setTechnicianId] = useState(String(job.technician.id));
  return (
    <View style={styles.box} role="group" aria-label="Assignment">
      <Select
        label="Assigned technician"
        value={technicianId}
        allLabel="Choose…"
        options={(technicians.data ?? []).map((t) => ({ value: String(t.id), label: t.name }))}
        onChange={setTechnicianId}
      />
      <Button
        label="Reassign"
        tone="secondary"
        disabled={!technicianId || technicianId === String(job.technician.id)}
        busy={update.isPending}
        onPress={() => update.mutate({ technicianId: Number(technicianId) })}
      />
      {update.isSuccess ? <Notice tone="info">{`Assigned to ${update.data.job.technician.name}.`}</Notice> : null}
      {update.error ? <Notice tone="error">{update.error.message}</Notice> : null}
    </View>
  );
}

const styles = StyleSheet.create({
  box: {
    flexDirection: 'row',
    flexWrap: 'wrap',
    gap: space.md,
    alignItems: 'flex-end',
    backgroundColor: colors.surface,
    borderWidth: 1,
    borderColor: colors.line,
    borderRadius: 8,
    padding: space.md,
  },
});
