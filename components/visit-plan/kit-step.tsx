// Step 6: the kit for the chosen camera class (the firm's list), and leaving the site: what was
// not ticked is shown once more, then the time of leaving is kept for planned against actual.
import { useState } from 'react';
import { StyleSheet, View } from 'react-native';

import { formatDateTime } from '@/components/lib/format';
import { Button } from '@/components/ui/button';
import { Checkbox } from '@/components/ui/checkbox';
import { Notice } from '@/components/ui/notice';
import { Text } from '@/components/ui/text';
import { colors, space } from '@/components/ui/theme';
import { CAMERA_CLASS_LABELS } from '@/shared/capture-record';
import { type CameraClassSettings, unTickedKit } from '@/shared/visit-settings';

import type { PlanValues } from './plan-values';

type Props = { values: PlanValues; settings: CameraClassSettings | null; change: (next: Partial<PlanValues>) => void };

export function KitStep({ values, settings, change }: Props) {
  const [leaving, setLeaving] = useState(false);
  if (!values.cameraClass || !settings) return <Text>Choose the camera class (step 2) to see its kit list.</Text>;
  const open = unTickedKit(settings.kitItems, values.kitTicked);
  const toggle = (item: string, on: boolean) =>
    change({ kitTicked: on ? [...values.kitTicked, item] : values.kitTicked.filter((i) => i !== item) });
  const leave = () => {
    change({ onSite: { ...values.onSite, leftAt: new Date().toISOString() } });
    setLeaving(false);
  };

  return (
    <View style={styles.step}>
      <View role="group" aria-label="Kit check" style={styles.step}>
        <Text>{`Kit for a ${CAMERA_CLASS_LABELS[values.cameraClass].toLowerCase()} (your firm's list):`}</Text>
        {settings.kitItems.map((item) => (
          <Checkbox key={item} label={item} checked={values.kitTicked.includes(item)} onChange={(on) => toggle(item, on)} />
        ))}
        <Text role="status" variant="label">
          {open.length === 0 ? 'Everything on the list is ticked.' : `${open.length} of ${settings.kitItems.length} not ticked yet.`}
        </Text>
      </View>

      <View style={styles.card}>
        <Text variant="heading" role="heading" aria-level={3}>
          Time on site
        </Text>
        <Text>{values.onSite.arrivedAt ? `Arrived ${formatDateTime(values.onSite.arrivedAt)}.` : 'Arrival not recorded.'}</Text>
        {values.onSite.leftAt ? (
          <>
            <Text>{`Left ${formatDateTime(values.onSite.leftAt)}.`}</Text>
            <Button label="Not left yet" tone="secondary" onPress={() => change({ onSite: { ...values.onSite, leftAt: null } })} />
          </>
        ) : leaving ? (
          <View style={styles.step} role="group" aria-label="Before you leave">
            {open.length > 0 ? (
              <Notice tone="caution">{`Not ticked on the kit list: ${open.join('; ')}. Check you have them before you go.`}</Notice>
            ) : (
              <Text>Everything on the kit list was ticked. Pack it all up.</Text>
            )}
            <View style={styles.actions}>
              <Button label="I have everything: record the time I left" onPress={leave} />
              <Button label="Not yet" tone="secondary" onPress={() => setLeaving(false)} />
            </View>
          </View>
        ) : (
          <Button label="Leaving the site" tone="secondary" onPress={() => setLeaving(true)} />
        )}
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  step: { gap: space.md },
  card: { gap: space.sm, borderWidth: 1, borderColor: colors.line, borderRadius: 8, padding: space.md, backgroundColor: colors.surface },
  actions: { flexDirection: 'row', flexWrap: 'wrap', gap: space.sm },
});
