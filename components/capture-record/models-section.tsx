import { useFieldArray, useWatch } from 'react-hook-form';
import { StyleSheet, View } from 'react-native';

import { Button } from '@/components/ui/button';
import { Section } from '@/components/ui/section';
import { Text } from '@/components/ui/text';
import { colors, space } from '@/components/ui/theme';
import { SPLIT_REASON_LABELS, SPLIT_REASONS, STRUCTURE_LABELS, STRUCTURES } from '@/shared/capture-record';
import { DETACHED_FIELD_LABELS, MODEL_FIELD_LABELS } from '@/shared/record-labels';

import { ChoiceInputField, options, TextInputField } from './controlled';
import { useRecordForm } from './form-context';
import { newKey } from './form-values';

export function ModelsSection() {
  const { control } = useRecordForm();
  const models = useFieldArray({ control, name: 'models', keyName: 'fieldId' });
  const structures = useFieldArray({ control, name: 'detachedStructures', keyName: 'fieldId' });
  const modelValues = useWatch({ control, name: 'models' });
  const modelOptions = modelValues.map((m, i) => ({ value: m.key, label: `Model ${i + 1}: ${STRUCTURE_LABELS[m.structure]}` }));

  return (
    <Section title="Models and structures" summary={`${models.fields.length} model(s), ${structures.fields.length} detached structure(s)`}>
      {models.fields.map((field, i) => (
        <View key={field.fieldId} style={styles.item} role="group" aria-label={`Model ${i + 1}`}>
          <Text variant="label">{`Model ${i + 1}`}</Text>
          <ChoiceInputField
            name={`models.${i}.structure`}
            label={MODEL_FIELD_LABELS.structure}
            options={options(STRUCTURES, STRUCTURE_LABELS)}
          />
          {modelValues[i]?.structure !== 'main_dwelling' ? (
            <>
              <ChoiceInputField
                name={`models.${i}.splitReason`}
                label={MODEL_FIELD_LABELS.splitReason}
                options={options(SPLIT_REASONS, SPLIT_REASON_LABELS)}
              />
              <TextInputField name={`models.${i}.splitNote`} label="Note on the split (optional)" />
            </>
          ) : null}
          <TextInputField name={`models.${i}.platformReference`} label={MODEL_FIELD_LABELS.platformReference} />
          <Button label={`Remove model ${i + 1}`} tone="secondary" onPress={() => models.remove(i)} />
        </View>
      ))}
      <Button
        label="Add a model"
        tone="secondary"
        onPress={() =>
          models.append({
            key: newKey('m'),
            structure: models.fields.length ? 'detached_garage' : 'main_dwelling',
            structureNote: '',
            splitReason: null,
            splitNote: '',
            platformReference: '',
          })
        }
      />
      <Text variant="label">Detached structures on the property</Text>
      {structures.fields.map((field, i) => (
        <View key={field.fieldId} style={styles.item} role="group" aria-label={`Detached structure ${i + 1}`}>
          <TextInputField name={`detachedStructures.${i}.name`} label={DETACHED_FIELD_LABELS.name} hint="e.g. Garden shed" />
          <ChoiceInputField
            name={`detachedStructures.${i}.structure`}
            label={DETACHED_FIELD_LABELS.structure}
            options={options(
              STRUCTURES.filter((s) => s !== 'main_dwelling'),
              STRUCTURE_LABELS,
            )}
          />
          {modelOptions.length ? (
            <ChoiceInputField name={`detachedStructures.${i}.modelKey`} label={DETACHED_FIELD_LABELS.modelKey} options={modelOptions} />
          ) : null}
          <TextInputField name={`detachedStructures.${i}.noModelReason`} label={DETACHED_FIELD_LABELS.noModelReason} />
          <Button label={`Remove structure ${i + 1}`} tone="secondary" onPress={() => structures.remove(i)} />
        </View>
      ))}
      <Button
        label="Add a detached structure"
        tone="secondary"
        onPress={() => structures.append({ key: newKey('s'), name: '', structure: 'detached_garage', modelKey: null, noModelReason: '' })}
      />
    </Section>
  );
}

const styles = StyleSheet.create({
  item: { borderWidth: 1, borderColor: colors.line, borderRadius: 6, padding: space.md, gap: space.sm },
});
