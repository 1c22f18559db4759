// The manager's kit lists and visit timing, one card per camera class. Saving is
// version-checked: a change made meanwhile by another manager is reported, not overwritten.
import { useState } from 'react';
import { StyleSheet, View } from 'react-native';

import { ApiError } from '@/components/lib/api-client';
import { type CameraClassSettingsView, useCameraClassesQuery, useCameraClassMutation } from '@/components/queries/visit-plan';
import { Button } from '@/components/ui/button';
import { FieldError } from '@/components/ui/field-error';
import { Notice } from '@/components/ui/notice';
import { Screen } from '@/components/ui/screen';
import { Text } from '@/components/ui/text';
import { TextField } from '@/components/ui/text-field';
import { colors, space } from '@/components/ui/theme';
import { CAMERA_CLASS_LABELS } from '@/shared/capture-record';

function ClassCard({ settings }: { settings: CameraClassSettingsView }) {
  const label = CAMERA_CLASS_LABELS[settings.cameraClass];
  const [kit, setKit] = useState(settings.kitItems.join('\n'));
  const [perStation, setPerStation] = useState(settings.minutesPerStation === null ? '' : String(settings.minutesPerStation));
  const [setup, setSetup] = useState(String(settings.setupMinutes));
  const [saved, setSaved] = useState<string | null>(null);
  const save = useCameraClassMutation(settings.cameraClass);
  const fields = save.error instanceof ApiError ? save.error.fields : {};

  const onSave = async () => {
    setSaved(null);
    const values = {
      kitItems: kit
        .split('\n')
        .map((line) => line.trim())
        .filter(Boolean),
      minutesPerStation: perStation.trim() === '' ? null : Number(perStation.replace(',', '.')),
      setupMinutes: Number(setup),
    };
    try {
      await save.mutateAsync({ values, baseVersion: settings.version });
      setSaved(`Saved. Plans made from now on use these for a ${label.toLowerCase()}.`);
    } catch {
      // The error is shown below, field by field.
    }
  };

  return (
    <View style={styles.card} role="group" aria-label={label}>
      <Text variant="heading" role="heading" aria-level={2}>
        {label}
      </Text>
      <Text variant="muted">
        {settings.version === 0 ? "Sightline's defaults (from memory); not changed yet." : `Version ${settings.version}.`}
      </Text>
      <TextField label={`Kit list for ${label} (one item a line)`} value={kit} onChangeText={setKit} multiline numberOfLines={6} />
      <FieldError message={fields.kitItems ?? Object.entries(fields).find(([k]) => k.startsWith('kitItems.'))?.[1]} />
      <TextField
        label={`Minutes per station, ${label} (empty: no stations)`}
        value={perStation}
        onChangeText={setPerStation}
        inputMode="decimal"
        error={fields.minutesPerStation}
      />
      <TextField
        label={`Set-up minutes per visit, ${label}`}
        value={setup}
        onChangeText={setSetup}
        inputMode="numeric"
        error={fields.setupMinutes}
      />
      {save.error && !(save.error instanceof ApiError && Object.keys(fields).length) ? (
        <Notice tone="error">
          {save.error instanceof ApiError && save.error.code === 'stale_version'
            ? 'Another manager changed these meanwhile. Reload the page to see their version, then make your change again.'
            : save.error.message}
        </Notice>
      ) : null}
      {saved ? <Text role="status">{saved}</Text> : null}
      <Button label={`Save ${label}`} onPress={() => void onSave()} busy={save.isPending} />
    </View>
  );
}

export function KitSettingsScreen() {
  const classes = useCameraClassesQuery();
  return (
    <Screen title="Kit and timing" subtitle="The kit check and the time estimate of every visit plan, per camera class">
      {classes.error ? <Notice tone="error">{classes.error.message}</Notice> : null}
      {classes.data?.map((settings) => (
        <ClassCard key={settings.cameraClass} settings={settings} />
      ))}
    </Screen>
  );
}

const styles = StyleSheet.create({
  card: {
    gap: space.sm,
    maxWidth: 760,
    borderWidth: 1,
    borderColor: colors.line,
    borderRadius: 8,
    padding: space.lg,
    backgroundColor: colors.surface,
  },
});
