import { useFieldArray } from 'react-hook-form';
import { StyleSheet, View } from 'react-native';

import { Button } from '@/components/ui/button';
import { Section } from '@/components/ui/section';
import { colors, space } from '@/components/ui/theme';
import { GAP_CAUSE_LABELS, GAP_CAUSES } from '@/shared/capture-record';
import { GAP_FIELD_LABELS } from '@/shared/record-labels';

import { ChoiceInputField, options, TextInputField, YesNoField } from './controlled';
import { useRecordForm } from './form-context';
import { newKey } from './form-values';

export function GapsSection() {
  const { control } = useRecordForm();
  const { fields, append, remove } = useFieldArray({ control, name: 'gaps', keyName: 'fieldId' });
  return (
    <Section title="Coverage gaps" summary={fields.length ? `${fields.length} noted` : 'None noted'}>
      {fields.map((field, i) => (
        <View key={field.fieldId} style={styles.item} role="group" aria-label={`Coverage gap ${i + 1}`}>
          <TextInputField name={`gaps.${i}.location`} label={GAP_FIELD_LABELS.location} hint="e.g. Sunroom, west windows" />
          <ChoiceInputField name={`gaps.${i}.cause`} label={GAP_FIELD_LABELS.cause} options={options(GAP_CAUSES, GAP_CAUSE_LABELS)} />
          <YesNoField name={`gaps.${i}.resolved`} label={GAP_FIELD_LABELS.resolved} />
          <TextInputField name={`gaps.${i}.note`} label="Note (optional)" />
          <Button label={`Remove gap ${i + 1}`} tone="secondary" onPress={() => remove(i)} />
        </View>
      ))}
      <Button
        label="Add a coverage gap"
        tone="secondary"
        onPress={() => append({ key: newKey('g'), location: '', cause: 'direct_sun', resolved: false, note: '' })}
      />
    </Section>
  );
}

const styles = StyleSheet.create({
  item: { borderWidth: 1, borderColor: colors.line, borderRadius: 6, padding: space.md, gap: space.sm },
});
