// The short sections of the capture record form.
import { Controller, useWatch } from 'react-hook-form';
import { View } from 'react-native';

import { formatDateTime } from '@/components/lib/format';
import { Checkbox } from '@/components/ui/checkbox';
import { ChoiceField } from '@/components/ui/choice-field';
import { Notice } from '@/components/ui/notice';
import { Section } from '@/components/ui/section';
import { Text } from '@/components/ui/text';
import { colors, space } from '@/components/ui/theme';
import { CAMERA_CLASS_LABELS, CAMERA_CLASSES, GLAZING_FLAGGED, type Hazard, HAZARD_LABELS, HAZARDS } from '@/shared/capture-record';
import { processingConfirmedFor } from '@/shared/pre-submit-checks';
import { SCALAR_FIELDS } from '@/shared/record-labels';
import type { LengthUnit } from '@/shared/units';

import { ChoiceInputField, options, TextInputField } from './controlled';
import { useRecordForm } from './form-context';

export function CameraSection({ onUnitsChange }: { onUnitsChange: (unit: LengthUnit) => void }) {
  const { control } = useRecordForm();
  const units = useWatch({ control, name: 'units' });
  const cameraClass = useWatch({ control, name: 'cameraClass' });
  return (
    <Section title="Camera and units" summary={cameraClass ? CAMERA_CLASS_LABELS[cameraClass] : 'Camera class not chosen'}>
      <ChoiceInputField name="cameraClass" label={SCALAR_FIELDS.cameraClass.label} options={options(CAMERA_CLASSES, CAMERA_CLASS_LABELS)} />
      <ChoiceField<LengthUnit>
        label={SCALAR_FIELDS.units.label}
        options={[
          { value: 'ft', label: 'Feet' },
          { value: 'm', label: 'Metres' },
        ]}
        value={units}
        onChange={onUnitsChange}
      />
      <ChoiceInputField
        name="glazingFlagged"
        label={SCALAR_FIELDS.glazingFlagged.label}
        options={options(GLAZING_FLAGGED, { yes: 'Yes', no: 'No', partly: 'Partly' })}
      />
    </Section>
  );
}

export function PanoramasSection() {
  const { control } = useRecordForm();
  const rooms = useWatch({ control, name: 'rooms' });
  return (
    <Section
      title="Supplementary panoramas"
      summary="Extra 360 photos not registered to stations, e.g. open cabinets"
      initiallyOpen={false}
    >
      <Text variant="muted">
        Common practice: open each damaged cabinet and set the camera level with its shelves, so the inside shows.
      </Text>
      <TextInputField name="panoramas.count" label="How many" numeric="numeric" />
      <Text variant="label">Rooms with panoramas</Text>
      <Controller
        control={control}
        name="panoramas.roomKeys"
        render={({ field }) => (
          <View>
            {rooms.map((room, i) => (
              <Checkbox
                key={room.key}
                label={room.name.trim() || `Room ${i + 1}`}
                checked={field.value.includes(room.key)}
                onChange={(on) => field.onChange(on ? [...field.value, room.key] : field.value.filter((k: string) => k !== room.key))}
              />
            ))}
          </View>
        )}
      />
    </Section>
  );
}

export function ProcessingSection({ previousSubmittedAt }: { previousSubmittedAt: string | null }) {
  const { control, errors } = useRecordForm();
  return (
    <Section title="Processing" summary="Required before submitting">
      <Controller
        control={control}
        name="processing"
        render={({ field }) => {
          const fresh = processingConfirmedFor(field.value, previousSubmittedAt);
          const stale = field.value.confirmed && !fresh;
          return (
            <View style={{ gap: space.xs }}>
              <Checkbox
                label="I checked that the uploaded capture started processing on the capture platform"
                hint={stale ? 'Your confirmation was for the last revision: confirm again for this one.' : undefined}
                checked={fresh}
                onChange={(confirmed) => field.onChange({ confirmed, confirmedAt: confirmed ? new Date().toISOString() : null })}
              />
              {fresh && field.value.confirmedAt ? (
                <Text variant="muted">{`Confirmed ${formatDateTime(field.value.confirmedAt)}`}</Text>
              ) : null}
              {errors['processing.confirmed'] ? (
                <Text role="alert" style={{ color: colors.fail }}>
                  {errors['processing.confirmed']}
                </Text>
              ) : null}
            </View>
          );
        }}
      />
    </Section>
  );
}

export function SafetySection() {
  const { control } = useRecordForm();
  return (
    <Section title="Site safety" summary="Hazards met on site" initiallyOpen={false}>
      <Notice tone="caution">
        Attics, crawl spaces, standing water, live wiring, roofs and ladders can hurt you. Follow your firm&apos;s safety policy and local
        codes; do not enter an unsafe space or touch wiring or structure that a licensed professional should assess. Record a gap instead of
        taking a risk.
      </Notice>
      <Controller
        control={control}
        name="safety.hazards"
        render={({ field }) => (
          <View>
            {HAZARDS.map((hazard: Hazard) => (
              <Checkbox
                key={hazard}
                label={HAZARD_LABELS[hazard]}
                checked={field.value.includes(hazard)}
                onChange={(on) => field.onChange(on ? [...field.value, hazard] : field.value.filter((h: Hazard) => h !== hazard))}
              />
            ))}
          </View>
        )}
      />
      <TextInputField name="safety.note" label="Safety note (optional)" multiline />
    </Section>
  );
}

export function NotesSection() {
  return (
    <Section title="Notes" summary="Anything the reviewer should know" initiallyOpen={false}>
      <TextInputField name="notes" label={SCALAR_FIELDS.notes.label} multiline />
    </Section>
  );
}
