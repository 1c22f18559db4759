import { Controller, useFieldArray, useWatch } from 'react-hook-form';
import { StyleSheet, View } from 'react-native';

import { Button } from '@/components/ui/button';
import { Checkbox } from '@/components/ui/checkbox';
import { Section } from '@/components/ui/section';
import { Text } from '@/components/ui/text';
import { colors, space } from '@/components/ui/theme';
import { damagePlaces, EXTERIOR_PLACE } from '@/shared/damage-places';
import type { StoredFile } from '@/shared/files';
import { LOSS_TYPE_LABELS, LOSS_TYPES } from '@/shared/jobs';
import { DAMAGE_FIELD_LABELS } from '@/shared/record-labels';

import { ChoiceInputField, options, TextInputField } from './controlled';
import { useRecordForm } from './form-context';
import { newKey } from './form-values';

export function DamageSection({ photos, defaultLossType }: { photos: StoredFile[]; defaultLossType: (typeof LOSS_TYPES)[number] }) {
  const { control, errors } = useRecordForm();
  const { fields, append, remove } = useFieldArray({ control, name: 'damageAreas', keyName: 'fieldId' });
  const rooms = useWatch({ control, name: 'rooms' });
  const detachedStructures = useWatch({ control, name: 'detachedStructures' });
  const placeOptions = damagePlaces({ rooms, detachedStructures }).map((p) => ({ value: p.key, label: p.label }));
  return (
    <Section title="Damage areas" summary={fields.length ? `${fields.length} recorded` : 'None recorded'}>
      {fields.map((field, i) => (
        <View key={field.fieldId} style={styles.item} role="group" aria-label={`Damage area ${i + 1}`}>
          <ChoiceInputField name={`damageAreas.${i}.roomKey`} label={DAMAGE_FIELD_LABELS.roomKey} options={placeOptions} />
          <TextInputField
            name={`damageAreas.${i}.description`}
            label={DAMAGE_FIELD_LABELS.description}
            hint="e.g. Ceiling stain about 3 ft across"
          />
          <ChoiceInputField
            name={`damageAreas.${i}.lossType`}
            label={DAMAGE_FIELD_LABELS.lossType}
            options={options(LOSS_TYPES, LOSS_TYPE_LABELS)}
          />
          <TextInputField
            name={`damageAreas.${i}.stationNumbers`}
            label={DAMAGE_FIELD_LABELS.stationNumbers}
            hint="Numbers, separated by commas"
          />
          <Text variant="label">Photos of this damage</Text>
          {photos.length === 0 ? <Text variant="muted">Upload photos under Files, then tick them here.</Text> : null}
          <Controller
            control={control}
            name={`damageAreas.${i}.photoFileIds`}
            render={({ field: photoField }) => (
              <View>
                {photos.map((photo) => (
                  <Checkbox
                    key={photo.id}
                    label={photo.caption ? `${photo.name}: ${photo.caption}` : photo.name}
                    checked={photoField.value.includes(photo.id)}
                    onChange={(on) =>
                      photoField.onChange(on ? [...photoField.value, photo.id] : photoField.value.filter((id: number) => id !== photo.id))
                    }
                  />
                ))}
              </View>
            )}
          />
          {errors[`damageAreas.${i}.photoFileIds`] ? (
            <Text role="alert" style={{ color: colors.fail }}>
              {errors[`damageAreas.${i}.photoFileIds`]}
            </Text>
          ) : null}
          <Button label={`Remove damage area ${i + 1}`} tone="secondary" onPress={() => remove(i)} />
        </View>
      ))}
      <Button
        label="Add a damage area"
        tone="secondary"
        onPress={() =>
          append({
            key: newKey('d'),
            roomKey: rooms[0]?.key ?? EXTERIOR_PLACE,
            description: '',
            lossType: defaultLossType,
            stationNumbers: '',
            photoFileIds: [],
          })
        }
      />
    </Section>
  );
}

const styles = StyleSheet.create({
  item: { borderWidth: 1, borderColor: colors.line, borderRadius: 6, padding: space.md, gap: space.sm },
});
