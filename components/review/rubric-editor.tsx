import { useEffect } from 'react';
import { Controller, useFieldArray, useForm, useWatch } from 'react-hook-form';
import { StyleSheet, View } from 'react-native';

import { ApiError } from '@/components/lib/api-client';
import { formatDateTime } from '@/components/lib/format';
import { useRubricCreateMutation, useRubricsQuery } from '@/components/queries/rubrics';
import { Button } from '@/components/ui/button';
import { Checkbox } from '@/components/ui/checkbox';
import { ChoiceField } from '@/components/ui/choice-field';
import { Notice } from '@/components/ui/notice';
import { Screen } from '@/components/ui/screen';
import { Text } from '@/components/ui/text';
import { TextField } from '@/components/ui/text-field';
import { colors, space } from '@/components/ui/theme';
import { RUBRIC_WEIGHT_TOTAL, weightTotal } from '@/shared/review-rules';
import { APPLIES_WHEN, APPLIES_WHEN_LABELS, type AppliesWhen, type Rubric } from '@/shared/rubric';

type CriterionForm = {
  key: string;
  title: string;
  guidance: string;
  weight: string;
  critical: boolean;
  appliesWhen: AppliesWhen;
  kind: 'levels' | 'pass_fail';
  levels: string[];
  stockReasons: string;
};
type Values = { passMark: string; criteria: CriterionForm[] };

function toForm(rubric: Rubric): Values {
  return {
    passMark: String(rubric.passMark),
    criteria: rubric.criteria.map((c) => ({
      key: c.key,
      title: c.title,
      guidance: c.guidance,
      weight: String(c.weight),
      critical: c.critical,
      appliesWhen: c.appliesWhen,
      kind: c.scale.kind,
      levels: c.scale.kind === 'levels' ? [...c.scale.levels] : ['', '', '', '', ''],
      stockReasons: c.stockReasons.join('\n'),
    })),
  };
}

export function RubricEditor() {
  const rubrics = useRubricsQuery();
  const create = useRubricCreateMutation();
  const current = rubrics.data?.[0];
  const form = useForm<Values>({ defaultValues: { passMark: '85', criteria: [] } });
  const { fields, append, remove } = useFieldArray({ control: form.control, name: 'criteria' });
  const criteria = useWatch({ control: form.control, name: 'criteria' });
  const weightSum = weightTotal(criteria);

  useEffect(() => {
    if (current) form.reset(toForm(current));
  }, [current?.version]); // eslint-disable-line react-hooks/exhaustive-deps

  const save = form.handleSubmit(async (values) => {
    try {
      await create.mutateAsync({
        passMark: Number(values.passMark),
        criteria: values.criteria.map((c) => ({
          key: c.key.trim(),
          title: c.title,
          guidance: c.guidance,
          weight: Number(c.weight),
          critical: c.critical,
          appliesWhen: c.appliesWhen,
          scale:
            c.kind === 'levels'
              ? { kind: 'levels', levels: c.levels.map((l) => l.trim()) as [string, string, string, string, string] }
              : { kind: 'pass_fail' },
          stockReasons: c.stockReasons
            .split('\n')
            .map((r) => r.trim())
            .filter(Boolean),
        })),
      });
    } catch (error) {
      if (error instanceof ApiError)
        for (const [field, message] of Object.entries(error.fields)) form.setError(field as never, { message });
    }
  });

  const err = (name: string) =>
    (form.formState.errors as Record<string, unknown>) && (create.error instanceof ApiError ? create.error.fields[name] : undefined);

  return (
    <Screen
      title="Rubric"
      subtitle={
        current
          ? `Current: version ${current.version}, saved ${formatDateTime(current.createdAt)}. Saving creates the next version; reviews keep the version they used.`
          : 'Loading…'
      }
    >
      {create.isSuccess ? <Notice tone="info">{`Saved as version ${create.data.rubric.version}.`}</Notice> : null}
      {create.error instanceof ApiError ? <Notice tone="error">{create.error.message}</Notice> : null}
      <Controller
        control={form.control}
        name="passMark"
        render={({ field }) => (
          <TextField
            label="Pass mark (0 to 100)"
            inputMode="decimal"
            value={field.value}
            onChangeText={field.onChange}
            error={err('passMark')}
          />
        )}
      />
      <Text
        role="status"
        style={{ color: weightSum === RUBRIC_WEIGHT_TOTAL ? colors.pass : colors.fail }}
      >{`Weights add up to ${weightSum} (must be ${RUBRIC_WEIGHT_TOTAL})`}</Text>
      {fields.map((field, i) => (
        <View key={field.id} style={styles.card} role="group" aria-label={`Criterion ${i + 1}`}>
          <View style={styles.row}>
            <View style={styles.grow}>
              <Controller
                control={form.control}
                name={`criteria.${i}.title`}
                render={({ field: f }) => (
                  <TextField label="Title" value={f.value} onChangeText={f.onChange} error={err(`criteria.${i}.title`)} />
                )}
              />
            </View>
            <View style={{ width: 160 }}>
              <Controller
                control={form.control}
                name={`criteria.${i}.key`}
                render={({ field: f }) => (
                  <TextField label="Key" autoCapitalize="none" value={f.value} onChangeText={f.onChange} error={err(`criteria.${i}.key`)} />
                )}
              />
            </View>
            <View style={{ width: 110 }}>
              <Controller
                control={form.control}
                name={`criteria.${i}.weight`}
                render={({ field: f }) => (
                  <TextField
                    label="Weight"
                    inputMode="numeric"
                    value={f.value}
                    onChangeText={f.onChange}
                    error={err(`criteria.${i}.weight`)}
                  />
                )}
              />
            </View>
          </View>
          <Controller
            control={form.control}
            name={`criteria.${i}.guidance`}
            render={({ field: f }) => <TextField label="Guidance for reviewers" multiline value={f.value} onChangeText={f.onChange} />}
          />
          <Controller
            control={form.control}
            name={`criteria.${i}.critical`}
            render={({ field: f }) => (
              <Checkbox label="Critical: fails the review at its lowest level" checked={f.value} onChange={f.onChange} />
            )}
          />
          <Controller
            control={form.control}
            name={`criteria.${i}.appliesWhen`}
            render={({ field: f }) => (
              <ChoiceField<AppliesWhen>
                label="Applies"
                options={APPLIES_WHEN.map((a) => ({ value: a, label: APPLIES_WHEN_LABELS[a] }))}
                value={f.value}
                onChange={f.onChange}
              />
            )}
          />
          <Controller
            control={form.control}
            name={`criteria.${i}.kind`}
            render={({ field: f }) => (
              <ChoiceField<'levels' | 'pass_fail'>
                label="Scale"
                options={[
                  { value: 'levels', label: 'Levels 0 to 4' },
                  { value: 'pass_fail', label: 'Pass / fail' },
                ]}
                value={f.value}
                onChange={f.onChange}
              />
            )}
          />
          {criteria[i]?.kind === 'levels'
            ? [0, 1, 2, 3, 4].map((level) => (
                <Controller
                  key={level}
                  control={form.control}
                  name={`criteria.${i}.levels.${level}`}
                  render={({ field: f }) => (
                    <TextField
                      label={`Level ${level} means`}
                      value={f.value}
                      onChangeText={f.onChange}
                      error={err(`criteria.${i}.scale.levels.${level}`)}
                    />
                  )}
                />
              ))
            : null}
          <Controller
            control={form.control}
            name={`criteria.${i}.stockReasons`}
            render={({ field: f }) => (
              <TextField
                label="Stock reasons (one per line)"
                multiline
                value={f.value}
                onChangeText={f.onChange}
                style={{ minHeight: 80 }}
              />
            )}
          />
          <Button label={`Remove ${criteria[i]?.title || `criterion ${i + 1}`}`} tone="secondary" onPress={() => remove(i)} />
        </View>
      ))}
      <View style={styles.row}>
        <Button
          label="Add a criterion"
          tone="secondary"
          onPress={() =>
            append({
              key: `criterion_${fields.length + 1}`,
              title: '',
              guidance: '',
              weight: '0',
              critical: false,
              appliesWhen: 'always',
              kind: 'levels',
              levels: ['', '', '', '', ''],
              stockReasons: '',
            })
          }
        />
        <Button
          label="Save as a new version"
          onPress={() => void save()}
          busy={create.isPending}
          disabled={weightSum !== RUBRIC_WEIGHT_TOTAL}
        />
      </View>
      {rubrics.data && rubrics.data.length > 1 ? (
        <Text variant="muted">{`Earlier versions: ${rubrics.data
          .slice(1)
          .map((r) => `v${r.version} (${formatDateTime(r.createdAt)})`)
          .join(', ')}`}</Text>
      ) : null}
    </Screen>
  );
}

const styles = StyleSheet.create({
  card: { backgroundColor: colors.surface, borderWidth: 1, borderColor: colors.line, borderRadius: 8, padding: space.lg, gap: space.sm },
  row: { flexDirection: 'row', flexWrap: 'wrap', gap: space.md, alignItems: 'flex-end' },
  grow: { flexGrow: 1, flexBasis: 240 },
});
