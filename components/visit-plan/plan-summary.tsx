// A visit plan read back: for the reviewer beside the record, the manager, and the
// technician's job page. Planned against actual where both are known.
import { View } from 'react-native';

import { formatDateTime } from '@/components/lib/format';
import { Text } from '@/components/ui/text';
import { space } from '@/components/ui/theme';
import { CAMERA_CLASS_LABELS, HAZARD_LABELS, LEVEL_LABELS, SPLIT_REASON_LABELS } from '@/shared/capture-record';
import { AREA_LABEL, fromSquareMetres, roundTo } from '@/shared/units';
import { PLAN_STRUCTURE_LABELS, type VisitPlan } from '@/shared/visit-plan';
import { type CameraClassSettings, unTickedKit } from '@/shared/visit-settings';
import { formatMinutes, minutesOnSite, outdoorStations, visitEstimate } from '@/shared/visit-suggestions';

const Line = ({ label, value }: { label: string; value: string }) => (
  <Text variant="small">
    <Text variant="label">{`${label}: `}</Text>
    {value || '—'}
  </Text>
);

export function PlanSummary({ plan, settings }: { plan: VisitPlan; settings: CameraClassSettings | null }) {
  const estimate = visitEstimate(plan, settings);
  const actual = minutesOnSite(plan.onSite);
  const open = settings ? unTickedKit(settings.kitItems, plan.kitTicked) : [];
  return (
    <View style={{ gap: space.xs }}>
      <Line
        label="Structures"
        value={plan.structures
          .map(
            (s) =>
              `${s.name.trim() || PLAN_STRUCTURE_LABELS[s.kind]}${s.inScope ? '' : ' (not in scope)'}${s.reachableInside ? '' : ' (no inside access)'}`,
          )
          .join('; ')}
      />
      <Line
        label="Camera"
        value={
          plan.cameraClass
            ? `${CAMERA_CLASS_LABELS[plan.cameraClass]}. ${outdoorStations(plan.cameraClass, plan.conditions).explanation}`
            : ''
        }
      />
      <Line
        label={`Models planned (${plan.models.length})`}
        value={plan.models
          .map((m, i) => `${i + 1}. ${m.structureNote}${m.splitReason ? ` — split: ${SPLIT_REASON_LABELS[m.splitReason]}` : ''}`)
          .join('; ')}
      />
      <Line label="Start on" value={plan.startLevel ? LEVEL_LABELS[plan.startLevel] : ''} />
      <Line
        label={`Rooms planned (${plan.rooms.length})`}
        value={estimate.rooms
          .map(
            (r) =>
              `${r.name}${r.areaM2 ? ` ~${roundTo(fromSquareMetres(r.areaM2, plan.units), 0)} ${AREA_LABEL[plan.units]}` : ''}${r.stations ? `, ${r.stations} st.` : ''}`,
          )
          .join('; ')}
      />
      <Line label="Expected stations" value={String(estimate.stations)} />
      <Line
        label="Time on site"
        value={`planned ${estimate.minutes === null ? 'not estimated' : formatMinutes(estimate.minutes)}, actual ${actual === null ? 'not recorded yet' : formatMinutes(actual)}`}
      />
      {plan.onSite.arrivedAt ? <Line label="Arrived" value={formatDateTime(plan.onSite.arrivedAt)} /> : null}
      <Line label="Hazards ticked" value={plan.hazards.map((h) => HAZARD_LABELS[h]).join(', ')} />
      {settings ? <Line label="Kit not ticked" value={open.length ? open.join(', ') : 'none'} /> : null}
      {plan.notes ? <Line label="Notes" value={plan.notes} /> : null}
    </View>
  );
}
