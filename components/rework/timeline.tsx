import { StyleSheet, View } from 'react-native';

import { formatDateTime } from '@/components/lib/format';
import { useTimelineQuery } from '@/components/queries/timeline';
import { Section } from '@/components/ui/section';
import { Text } from '@/components/ui/text';
import { colors, space } from '@/components/ui/theme';
import { describeEvent } from '@/shared/timeline';

export function Timeline({ jobId }: { jobId: number }) {
  const events = useTimelineQuery(jobId);
  return (
    <Section title="Timeline" summary={events.data ? `${events.data.length} event(s)` : 'Loading…'} initiallyOpen={false}>
      <View role="list" style={{ gap: space.xs }}>
        {(events.data ?? []).map((event) => (
          <View key={event.id} role="listitem" style={styles.row}>
            <Text variant="muted" style={styles.time}>
              {formatDateTime(event.createdAt)}
            </Text>
            <Text variant="small" style={{ flexShrink: 1 }}>{`${describeEvent(event)}${event.actor ? ` · ${event.actor}` : ''}`}</Text>
          </View>
        ))}
      </View>
    </Section>
  );
}

const styles = StyleSheet.create({
  row: { flexDirection: 'row', gap: space.md, borderLeftWidth: 3, borderLeftColor: colors.line, paddingLeft: space.sm, flexWrap: 'wrap' },
  time: { minWidth: 170 },
});
