// Step 4: stations to expect per room and in all, and the time on site they mean, so the
// technician and the manager see whether the visit fits the day.
import { StyleSheet, View } from 'react-native';

import { Text } from '@/components/ui/text';
import { colors, space } from '@/components/ui/theme';
import { CAMERA_CLASS_LABELS } from '@/shared/capture-record';
import { MAX_STATION_SPACING_M } from '@/shared/station-spacing';
import { AREA_LABEL, fromMetres, fromSquareMetres, roundTo } from '@/shared/units';
import type { VisitPlan } from '@/shared/visit-plan';
import type { CameraClassSettings } from '@/shared/visit-settings';
import { formatMinutes, visitEstimate } from '@/shared/visit-suggestions';

export function EffortStep({ plan, settings }: { plan: VisitPlan; settings: CameraClassSettings | null }) {
  if (!plan.cameraClass) return <Text>Choose the camera class (step 2) to estimate stations and time.</Text>;
  const estimate = visitEstimate(plan, settings);
  const spacing = MAX_STATION_SPACING_M[plan.cameraClass];
  const camera = CAMERA_CLASS_LABELS[plan.cameraClass].toLowerCase();
  return (
    <View style={styles.step}>
      <Text>
        {spacing === null
          ? `A ${camera} records a path, not stations: no station estimate.`
          : `About one station per ${roundTo(fromMetres(spacing, plan.units), 1)} ${plan.units} for a ${camera} (common practice), at least one a room; add one in each doorway.`}
      </Text>
      <View role="table" aria-label="Stations expected per room" style={styles.table}>
        {estimate.rooms.map((r) => (
          <View key={r.key} role="row" style={styles.row}>
            <Text role="cell" style={styles.name}>
              {r.name.trim() || 'Unnamed room'}
            </Text>
            <Text role="cell" variant="small">
              {r.areaM2 === null ? 'no size yet' : `${roundTo(fromSquareMetres(r.areaM2, plan.units), 0)} ${AREA_LABEL[plan.units]}`}
            </Text>
            <Text role="cell" style={styles.count}>
              {r.stations === null ? '—' : `${r.stations} station${r.stations === 1 ? '' : 's'}`}
            </Text>
          </View>
        ))}
      </View>
      <Text
        variant="label"
        role="status"
      >{`Expected stations: ${estimate.stations}${estimate.unsized ? ` (${estimate.unsized} room${estimate.unsized === 1 ? '' : 's'} without a size not counted)` : ''}`}</Text>
      {estimate.minutes === null || !settings || settings.minutesPerStation === null ? (
        <Text>No time estimate: this camera class has no time per station in the settings.</Text>
      ) : (
        <Text variant="label">
          {`Estimated time on site: ${formatMinutes(estimate.minutes)} (${settings.setupMinutes} min set-up + ${estimate.stations} stations × ${settings.minutesPerStation} min).`}
        </Text>
      )}
      <Text variant="muted">Times per station are the firm&apos;s settings; Sightline&apos;s defaults are from memory, not measured.</Text>
    </View>
  );
}

const styles = StyleSheet.create({
  step: { gap: space.md },
  table: { borderWidth: 1, borderColor: colors.line, borderRadius: 8, backgroundColor: colors.surface },
  row: {
    flexDirection: 'row',
    gap: space.md,
    padding: space.sm,
    borderBottomWidth: 1,
    borderBottomColor: colors.line,
    alignItems: 'center',
  },
  name: { flex: 1 },
  count: { minWidth: 90, textAlign: 'right' },
});
