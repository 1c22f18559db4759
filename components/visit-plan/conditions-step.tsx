// Step 2: the camera and the conditions outdoors, and from them the suggested models. The
// technician accepts the suggestion, then may change each split's reason and note.
import { StyleSheet, View } from 'react-native';

import { Button } from '@/components/ui/button';
import { Checkbox } from '@/components/ui/checkbox';
import { ChoiceField } from '@/components/ui/choice-field';
import { Notice } from '@/components/ui/notice';
import { Text } from '@/components/ui/text';
import { TextField } from '@/components/ui/text-field';
import { colors, space } from '@/components/ui/theme';
import {
  CAMERA_CLASS_LABELS,
  CAMERA_CLASSES,
  type CameraClass,
  SPLIT_REASON_LABELS,
  SPLIT_REASONS,
  type SplitReason,
} from '@/shared/capture-record';
import type { PlannedModel, VisitPlan } from '@/shared/visit-plan';
import { modelCoverage, outdoorStations, suggestModels } from '@/shared/visit-suggestions';

import type { PlanValues } from './plan-values';

type Props = { values: PlanValues; plan: VisitPlan; change: (next: Partial<PlanValues>) => void };

const sameModels = (a: PlannedModel[], b: PlannedModel[]) => JSON.stringify(a) === JSON.stringify(b);

function ModelLine({ model, index }: { model: PlannedModel; index: number }) {
  return (
    <View style={styles.model}>
      <Text variant="label">{`Model ${index + 1}: ${model.structureNote}`}</Text>
      {model.splitReason ? <Text variant="small">{`Split: ${SPLIT_REASON_LABELS[model.splitReason]}. ${model.splitNote}`}</Text> : null}
    </View>
  );
}

export function ConditionsStep({ values, plan, change }: Props) {
  const outdoor = outdoorStations(plan.cameraClass, plan.conditions);
  const suggested = suggestModels(plan);
  const coverage = modelCoverage(plan);
  const asSuggested = values.modelsAccepted && sameModels(values.models, suggested);
  const stale = values.modelsAccepted && (coverage.uncovered.length > 0 || coverage.twice.length > 0);
  const updateModel = (key: string, patch: Partial<PlannedModel>) =>
    change({ models: values.models.map((m) => (m.key === key ? { ...m, ...patch } : m)) });

  return (
    <View style={styles.step}>
      <ChoiceField<CameraClass>
        label="Camera class"
        options={CAMERA_CLASSES.map((c) => ({ value: c, label: CAMERA_CLASS_LABELS[c] }))}
        value={values.cameraClass ?? undefined}
        onChange={(cameraClass) => change({ cameraClass })}
      />
      <Checkbox
        label="Direct sun on the outside walls now"
        checked={values.conditions.directSun}
        onChange={(directSun) => change({ conditions: { ...values.conditions, directSun } })}
      />
      <Checkbox
        label="Outdoor stations ruled out today"
        hint="Rain, a locked gate, a dog in the yard, ground too steep for the tripod."
        checked={values.conditions.outdoorBlocked}
        onChange={(outdoorBlocked) => change({ conditions: { ...values.conditions, outdoorBlocked } })}
      />
      <Text role="status">{outdoor.explanation}</Text>

      {asSuggested ? null : (
        <>
          <Text variant="heading" role="heading" aria-level={3}>
            Suggested models
          </Text>
          {suggested.length === 0 ? <Text variant="muted">Put at least one structure in scope (step 1).</Text> : null}
          {suggested.map((m, i) => (
            <ModelLine key={m.key} model={m} index={i} />
          ))}
        </>
      )}
      {suggested.length > 0 && !asSuggested ? (
        <Button
          label={
            values.modelsAccepted
              ? 'Use the suggested models again'
              : `Accept the ${suggested.length === 1 ? 'suggested model' : `${suggested.length} suggested models`}`
          }
          onPress={() => change({ models: suggested, modelsAccepted: true })}
        />
      ) : null}
      {stale ? (
        <Notice tone="caution">
          {`The structures changed since you accepted the models: ${[
            ...coverage.uncovered.map((s) => `${s.name || s.kind} is in no model`),
            ...coverage.twice.map((s) => `${s.name || s.kind} is in two models`),
          ].join('; ')}. Use the suggestion again or add it to the record by hand.`}
        </Notice>
      ) : null}

      {values.modelsAccepted && values.models.length > 0 ? (
        <View style={styles.step} role="group" aria-label="Your models">
          <Text variant="heading" role="heading" aria-level={3}>
            {`Your models (${values.models.length})`}
          </Text>
          {asSuggested ? <Text variant="small">As suggested. Change a reason or a note if the site says otherwise.</Text> : null}
          {values.models.map((m, i) => (
            <View key={m.key} style={styles.card}>
              <Text variant="label">{`Model ${i + 1}: ${m.structureNote}`}</Text>
              {i === 0 ? (
                <Text variant="small">The main model: every structure linked by stations.</Text>
              ) : (
                <>
                  <ChoiceField<SplitReason>
                    label={`Reason for splitting model ${i + 1}`}
                    options={SPLIT_REASONS.map((r) => ({ value: r, label: SPLIT_REASON_LABELS[r] }))}
                    value={m.splitReason ?? undefined}
                    onChange={(splitReason) => updateModel(m.key, { splitReason })}
                  />
                  <TextField
                    label={`Split note (model ${i + 1})`}
                    value={m.splitNote}
                    onChangeText={(splitNote) => updateModel(m.key, { splitNote })}
                    multiline
                    maxLength={500}
                  />
                </>
              )}
            </View>
          ))}
        </View>
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  step: { gap: space.md },
  model: { gap: 2, borderLeftWidth: 4, borderLeftColor: colors.line, paddingLeft: space.md },
  card: { gap: space.sm, borderWidth: 1, borderColor: colors.line, borderRadius: 8, padding: space.md, backgroundColor: colors.surface },
});
