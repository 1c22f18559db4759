import { Pressable, ScrollView, StyleSheet } from 'react-native';

import { Text } from '@/components/ui/text';
import { colors, fonts, space } from '@/components/ui/theme';
import { JOB_STATUS_LABELS, JOB_STATUSES, type JobStatus } from '@/shared/jobs';

export function StatusFilter({ value, onChange }: { value: JobStatus | null; onChange: (status: JobStatus | null) => void }) {
  const options: (JobStatus | null)[] = [null, ...JOB_STATUSES];
  return (
    <ScrollView
      horizontal
      showsHorizontalScrollIndicator={false}
      contentContainerStyle={styles.row}
      role="radiogroup"
      aria-label="Filter by status"
    >
      {options.map((status) => {
        const selected = status === value;
        return (
          <Pressable
            key={status ?? 'all'}
            role="radio"
            aria-checked={selected}
            accessibilityLabel={status ? JOB_STATUS_LABELS[status] : 'All statuses'}
            onPress={() => onChange(status)}
            style={[styles.chip, selected && styles.selected]}
          >
            <Text style={[styles.text, selected && styles.selectedText]}>{status ? JOB_STATUS_LABELS[status] : 'All'}</Text>
          </Pressable>
        );
      })}
    </ScrollView>
  );
}

const styles = StyleSheet.create({
  row: { gap: space.sm, paddingVertical: space.xs },
  chip: {
    borderWidth: 1,
    borderColor: colors.muted,
    borderRadius: 16,
    paddingHorizontal: space.md,
    paddingVertical: 6,
    backgroundColor: colors.surface,
  },
  selected: { backgroundColor: colors.ink, borderColor: colors.ink },
  text: { fontFamily: fonts.regular, fontSize: 14, color: colors.ink },
  selectedText: { color: colors.surface, fontFamily: fonts.semibold },
});
