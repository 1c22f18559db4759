// The visit plan, one short screen per step, autosaved like the capture record: kept on this
// phone at once, sent with the version it was based on, a conflict shown and never overwritten.
import { useRouter } from 'expo-router';
import { useCallback, useMemo, useState } from 'react';
import { Pressable, StyleSheet, View } from 'react-native';

import { SaveStatus } from '@/components/capture-record/save-status';
import { ConflictPanel } from '@/components/device/conflict-panel';
import { deviceKey } from '@/components/device/device-store';
import { useDraftSync } from '@/components/device/use-draft-sync';
import { type CameraClassSettingsView, type PlanVersion, useSavePlan } from '@/components/queries/visit-plan';
import { Button } from '@/components/ui/button';
import { Text } from '@/components/ui/text';
import { colors, fonts, space } from '@/components/ui/theme';
import type { LossType } from '@/shared/jobs';
import { diffPlans } from '@/shared/plan-diff';
import type { VisitPlan } from '@/shared/visit-plan';

import { ConditionsStep } from './conditions-step';
import { EffortStep } from './effort-step';
import { HazardsStep } from './hazards-step';
import { KitStep } from './kit-step';
import { type PlanValues, toPlan, toPlanValues } from './plan-values';
import { RoomsStep } from './rooms-step';
import { newStructure, StructuresStep } from './structures-step';

export const PLAN_STEPS = [
  'Structures',
  'Camera and models',
  'Start and rooms',
  'Stations and time',
  'Hazards',
  'Kit and leaving',
] as const;

type Props = {
  jobId: number;
  userId: number;
  lossType: LossType;
  accessNotes: string | null;
  server: PlanVersion;
  settings: CameraClassSettingsView[];
};

const planOf = (server: PlanVersion) => server.plan;
const samePlan = (a: VisitPlan, b: VisitPlan) =>
  diffPlans(a, b).length === 0 &&
  JSON.stringify(a.models.map((m) => m.structureKeys)) === JSON.stringify(b.models.map((m) => m.structureKeys));
const toDoc = (values: PlanValues) => toPlan(values).plan;

// A new plan starts with the dwelling and the arrival time. Hazards start unticked: the loss
// suggests them (listed first), the technician says what is really there.
function startingValues(server: PlanVersion, lossType: LossType): { values: PlanValues; fresh: boolean } {
  if (server.version > 0) return { values: toPlanValues(server.plan), fresh: false };
  const structures = [newStructure('main_dwelling', lossType)];
  const plan: VisitPlan = {
    ...server.plan,
    structures,
    onSite: { arrivedAt: new Date().toISOString(), leftAt: null },
  };
  return { values: toPlanValues(plan), fresh: true };
}

export function PlanEditor({ jobId, userId, lossType, accessNotes, server, settings }: Props) {
  const router = useRouter();
  const [start] = useState(() => startingValues(server, lossType));
  const [values, setValues] = useState<PlanValues>(start.values);
  const [step, setStep] = useState(0);
  const conversion = useMemo(() => toPlan(values), [values]);
  const plan = conversion.plan;
  const change = useCallback((next: Partial<PlanValues>) => setValues((current) => ({ ...current, ...next })), []);
  const save = useSavePlan(jobId);
  const sync = useDraftSync<PlanVersion, VisitPlan, PlanValues>({
    storageKey: deviceKey.plan(userId, jobId),
    server,
    values,
    toDoc,
    docOf: planOf,
    save,
    replaceValues: setValues,
    sameFacts: samePlan,
    startsChanged: start.fresh,
  });
  const classSettings = plan.cameraClass ? (settings.find((s) => s.cameraClass === plan.cameraClass) ?? null) : null;

  const body = [
    <StructuresStep key="s" values={values} change={change} lossType={lossType} accessNotes={accessNotes} />,
    <ConditionsStep key="c" values={values} plan={plan} change={change} />,
    <RoomsStep key="r" values={values} plan={plan} errors={conversion.errors} change={change} />,
    <EffortStep key="e" plan={plan} settings={classSettings} />,
    <HazardsStep key="h" values={values} lossType={lossType} change={change} />,
    <KitStep key="k" values={values} settings={classSettings} change={change} />,
  ][step];

  const finish = async () => {
    await sync.flush();
    router.push(`/jobs/${jobId}`);
  };

  return (
    <View style={styles.editor} role="form" aria-label="Visit plan">
      <SaveStatus status={sync.status} problems={Object.keys({ ...conversion.errors, ...sync.refused }).length} />
      {sync.status.kind === 'conflict' && sync.mine ? (
        <ConflictPanel
          what="plan"
          differences={diffPlans(sync.status.theirs.plan, toDoc(sync.mine))}
          savedAt={sync.status.theirs.savedAt}
          onKeepMine={() => void sync.keepMine()}
          onUseTheirs={() => sync.status.kind === 'conflict' && void sync.useTheirs(toPlanValues(sync.status.theirs.plan))}
        />
      ) : null}
      <View role="tablist" aria-label="Plan steps" style={styles.steps}>
        {PLAN_STEPS.map((title, i) => (
          <Pressable
            key={title}
            role="tab"
            aria-selected={i === step}
            accessibilityLabel={`Step ${i + 1}: ${title}`}
            onPress={() => setStep(i)}
            style={[styles.stepTab, i === step && styles.stepTabOn]}
          >
            <Text style={[styles.stepText, i === step && styles.stepTextOn]}>{`${i + 1}`}</Text>
          </Pressable>
        ))}
      </View>
      <Text variant="heading" role="heading" aria-level={2}>
        {`Step ${step + 1} of ${PLAN_STEPS.length}: ${PLAN_STEPS[step]}`}
      </Text>
      {body}
      <View style={styles.nav}>
        {step > 0 ? <Button label={`Back: ${PLAN_STEPS[step - 1]}`} tone="secondary" onPress={() => setStep(step - 1)} /> : null}
        {step < PLAN_STEPS.length - 1 ? (
          <Button label={`Next: ${PLAN_STEPS[step + 1]}`} onPress={() => setStep(step + 1)} />
        ) : (
          <Button label="Open the capture record" onPress={() => void finish()} />
        )}
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  editor: { gap: space.md },
  steps: { flexDirection: 'row', gap: space.sm, flexWrap: 'wrap' },
  stepTab: {
    minWidth: 44,
    minHeight: 44,
    alignItems: 'center',
    justifyContent: 'center',
    borderWidth: 1,
    borderColor: colors.ink,
    borderRadius: 22,
  },
  stepTabOn: { backgroundColor: colors.ink },
  stepText: { fontFamily: fonts.semibold, color: colors.ink },
  stepTextOn: { color: colors.surface },
  nav: { flexDirection: 'row', flexWrap: 'wrap', gap: space.md, justifyContent: 'space-between' },
});
