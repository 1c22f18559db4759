import { Link } from 'expo-router';
import { StyleSheet, View } from 'react-native';

import { Text } from '@/components/ui/text';
import { colors, fonts, space } from '@/components/ui/theme';
import { type JobSummary, LOSS_TYPE_LABELS, PRIORITY_LABELS, PROPERTY_TYPE_LABELS } from '@/shared/jobs';

import { DueText } from './due-text';
import { StatusBadge } from './status-badge';

export function JobCard({ job }: { job: JobSummary }) {
  return (
    // The link's name is its visible text: claim, state, address, loss and due time.
    <Link href={`/jobs/${job.id}` as never} style={styles.link}>
      <View style={styles.card}>
        <View style={styles.top}>
          <Text style={styles.claim}>{job.claimReference}</Text>
          <StatusBadge status={job.status} />
        </View>
        <Text>{`${job.street}, ${job.city}`}</Text>
        <Text variant="muted">
          {`${LOSS_TYPE_LABELS[job.lossType]} loss · ${PROPERTY_TYPE_LABELS[job.propertyType]}` +
            (job.priority !== 'normal' ? ` · ${PRIORITY_LABELS[job.priority]}` : '')}
        </Text>
        <DueText job={job} />
      </View>
    </Link>
  );
}

const styles = StyleSheet.create({
  link: { textDecorationLine: 'none' },
  card: {
    backgroundColor: colors.surface,
    borderWidth: 1,
    borderColor: colors.line,
    borderRadius: 8,
    padding: space.lg,
    gap: space.xs,
    width: '100%',
  },
  top: { flexDirection: 'row', justifyContent: 'space-between', alignItems: 'center', gap: space.sm },
  claim: { fontFamily: fonts.semibold, fontSize: 16, color: colors.ink },
});
