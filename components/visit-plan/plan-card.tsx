// The visit plan on the job page: the technician's way in (plan before the first station),
// and for everyone else the plan read back, collapsed.
import { Link } from 'expo-router';
import { StyleSheet, View } from 'react-native';

import { useCameraClassesQuery } from '@/components/queries/visit-plan';
import { Section } from '@/components/ui/section';
import { Text } from '@/components/ui/text';
import { colors, fonts, space } from '@/components/ui/theme';
import type { VisitPlan } from '@/shared/visit-plan';

import { PlanSummary } from './plan-summary';

type Props = { jobId: number; plan: VisitPlan | null; canPlan: boolean };

export function PlanCard({ jobId, plan, canPlan }: Props) {
  const classes = useCameraClassesQuery();
  const settings = classes.data?.find((c) => c.cameraClass === plan?.cameraClass) ?? null;
  const summary = plan
    ? `${plan.models.length} model(s), ${plan.rooms.length} room(s) planned`
    : canPlan
      ? 'Plan at the door: structures, models, start, hazards and kit'
      : 'No plan made';
  return (
    <Section title="Visit plan" summary={summary} initiallyOpen={canPlan && !plan}>
      {canPlan ? (
        <View style={styles.row}>
          <Link href={`/jobs/${jobId}/plan`} style={styles.link} aria-label={plan ? 'Open the visit plan' : 'Plan the visit'}>
            {plan ? 'Open the visit plan' : 'Plan the visit'}
          </Link>
          {plan ? null : <Text variant="muted">Two or three minutes at the door; the capture record then starts filled in.</Text>}
        </View>
      ) : null}
      {plan ? <PlanSummary plan={plan} settings={settings} /> : null}
    </Section>
  );
}

const styles = StyleSheet.create({
  row: { gap: space.sm },
  link: {
    alignSelf: 'flex-start',
    minHeight: 44,
    paddingHorizontal: space.lg,
    paddingVertical: 10,
    borderRadius: 6,
    backgroundColor: colors.ink,
    color: colors.surface,
    fontFamily: fonts.semibold,
  },
});
