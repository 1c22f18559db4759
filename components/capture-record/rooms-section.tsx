import { useFieldArray, useWatch } from 'react-hook-form';
import { StyleSheet, View } from 'react-native';

import { Button } from '@/components/ui/button';
import { Section } from '@/components/ui/section';
import { Text } from '@/components/ui/text';
import { colors, space } from '@/components/ui/theme';
import { LEVEL_KINDS, LEVEL_LABELS, REFLECTIVE_KINDS } from '@/shared/capture-record';
import { reflectiveFlaggedLabel, reflectiveFoundLabel, ROOM_FIELD_LABELS } from '@/shared/record-labels';

import { ChoiceInputField, options, TextInputField, YesNoField } from './controlled';
import { useRecordForm } from './form-context';
import { emptyRoom } from './form-values';

export function RoomsSection() {
  const { control, unitLabel } = useRecordForm();
  const { fields, append, remove } = useFieldArray({ control, name: 'rooms', keyName: 'fieldId' });
  const rooms = useWatch({ control, name: 'rooms' });
  return (
    <Section title="Rooms" summary={`${fields.length} room${fields.length === 1 ? '' : 's'}, with their stations and reflective surfaces`}>
      {fields.map((field, i) => {
        const name = rooms[i]?.name?.trim() || `Room ${i + 1}`;
        return (
          <View key={field.fieldId} style={styles.room} role="group" aria-label={name}>
            <Text variant="label">{name}</Text>
            <TextInputField name={`rooms.${i}.name`} label={ROOM_FIELD_LABELS.name} />
            <ChoiceInputField name={`rooms.${i}.level`} label={ROOM_FIELD_LABELS.level} options={options(LEVEL_KINDS, LEVEL_LABELS)} />
            <View style={styles.row}>
              <View style={styles.cell}>
                <TextInputField name={`rooms.${i}.length`} label={`Length (${unitLabel})`} numeric="decimal" />
              </View>
              <View style={styles.cell}>
                <TextInputField name={`rooms.${i}.width`} label={`Width (${unitLabel})`} numeric="decimal" />
              </View>
              <View style={styles.cell}>
                <TextInputField name={`rooms.${i}.area`} label={`or area (${unitLabel}²)`} hint="If not a rectangle" numeric="decimal" />
              </View>
            </View>
            <TextInputField name={`rooms.${i}.stations`} label={ROOM_FIELD_LABELS.stations} numeric="numeric" />
            <YesNoField name={`rooms.${i}.doorwayStation`} label={ROOM_FIELD_LABELS.doorwayStation} />
            <Text variant="label">Reflective surfaces: found / flagged in the capture</Text>
            {REFLECTIVE_KINDS.map((kind) => (
              <View key={kind} style={styles.row}>
                <View style={styles.cell}>
                  <TextInputField name={`rooms.${i}.reflective.${kind}.found`} label={reflectiveFoundLabel(kind)} numeric="numeric" />
                </View>
                <View style={styles.cell}>
                  <TextInputField name={`rooms.${i}.reflective.${kind}.flagged`} label={reflectiveFlaggedLabel(kind)} numeric="numeric" />
                </View>
              </View>
            ))}
            <Button label={`Remove ${name}`} tone="secondary" onPress={() => remove(i)} />
          </View>
        );
      })}
      <Button label="Add a room" tone="secondary" onPress={() => append(emptyRoom(rooms[rooms.length - 1]?.level ?? 'ground'))} />
    </Section>
  );
}

const styles = StyleSheet.create({
  room: { borderWidth: 1, borderColor: colors.line, borderRadius: 6, padding: space.md, gap: space.sm },
  row: { flexDirection: 'row', flexWrap: 'wrap', gap: space.sm },
  cell: { flexGrow: 1, flexBasis: 100 },
});
