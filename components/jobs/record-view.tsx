// A submitted revision, read-only: what the reviewer and the technician see after submit.
import { StyleSheet, View } from 'react-native';

import { formatDateTime } from '@/components/lib/format';
import { Text } from '@/components/ui/text';
import { colors, space } from '@/components/ui/theme';
import {
  CAMERA_CLASS_LABELS,
  type CaptureRecord,
  GAP_CAUSE_LABELS,
  HAZARD_LABELS,
  LEVEL_LABELS,
  REFLECTIVE_LABELS,
  roomAreaM2,
  SPLIT_REASON_LABELS,
  STRUCTURE_LABELS,
} from '@/shared/capture-record';
import { AREA_LABEL, fromMetres, fromSquareMetres, roundTo } from '@/shared/units';

function Fact({ label, value }: { label: string; value: string }) {
  return (
    <View style={styles.fact}>
      <Text variant="muted">{label}</Text>
      <Text>{value}</Text>
    </View>
  );
}

export function RecordView({ record }: { record: CaptureRecord }) {
  const unit = record.units;
  const size = (m: number | null) => (m === null ? '–' : `${roundTo(fromMetres(m, unit), 1)}`);
  return (
    <View style={{ gap: space.md }}>
      <View style={styles.facts}>
        <Fact label="Camera class" value={record.cameraClass ? CAMERA_CLASS_LABELS[record.cameraClass] : 'not given'} />
        <Fact label="Stations" value={`${record.totalStations ?? '–'} (exterior ${record.exteriorStations})`} />
        <Fact label="Levels" value={record.levels.map((l) => `${LEVEL_LABELS[l.level]} ${l.stations}`).join(', ') || 'none'} />
        <Fact label="Glazing flagged" value={record.glazingFlagged ?? 'not given'} />
        <Fact
          label="Processing"
          value={
            record.processing.confirmed
              ? `Confirmed${record.processing.confirmedAt ? ` ${formatDateTime(record.processing.confirmedAt)}` : ''}`
              : 'Not confirmed'
          }
        />
        <Fact label="Panoramas" value={String(record.panoramas.count)} />
      </View>
      <Text variant="label">Rooms</Text>
      {record.rooms.map((room) => {
        const area = roomAreaM2(room);
        return (
          <View key={room.key} style={styles.row}>
            <Text variant="label">{`${room.name} · ${LEVEL_LABELS[room.level]}`}</Text>
            <Text variant="small">
              {`${size(room.lengthM)} × ${size(room.widthM)} ${unit}` +
                (area !== null ? ` (${roundTo(fromSquareMetres(area, unit), 1)} ${AREA_LABEL[unit]})` : '') +
                ` · ${room.stations} station(s) · doorway station: ${room.doorwayStation ? 'yes' : 'no'}`}
            </Text>
            {room.reflective.map((r) => (
              <Text key={r.kind} variant="small">{`${REFLECTIVE_LABELS[r.kind]}: ${r.found} found, ${r.flagged} flagged`}</Text>
            ))}
          </View>
        );
      })}
      <Text variant="label">Models</Text>
      {record.models.map((m) => (
        <Text key={m.key} variant="small">
          {`${STRUCTURE_LABELS[m.structure]} · ${m.platformReference || 'no reference'}` +
            (m.splitReason ? ` · split: ${SPLIT_REASON_LABELS[m.splitReason]}` : '')}
        </Text>
      ))}
      {record.gaps.length ? <Text variant="label">Coverage gaps</Text> : null}
      {record.gaps.map((g) => (
        <Text
          key={g.key}
          variant="small"
        >{`${g.location} · ${GAP_CAUSE_LABELS[g.cause]} · ${g.resolved ? 'resolved' : 'NOT resolved'}${g.note ? ` · ${g.note}` : ''}`}</Text>
      ))}
      {record.damageAreas.length ? <Text variant="label">Damage areas</Text> : null}
      {record.damageAreas.map((d) => (
        <Text key={d.key} variant="small">
          {`${record.rooms.find((r) => r.key === d.roomKey)?.name ?? 'Room'}: ${d.description} · stations ${d.stationNumbers.join(', ') || 'none'} · ${d.photoFileIds.length} photo(s)`}
        </Text>
      ))}
      {record.safety.hazards.length ? (
        <Fact label="Hazards met" value={record.safety.hazards.map((h) => HAZARD_LABELS[h]).join(', ')} />
      ) : null}
      {record.notes ? <Fact label="Notes" value={record.notes} /> : null}
    </View>
  );
}

const styles = StyleSheet.create({
  facts: { flexDirection: 'row', flexWrap: 'wrap', gap: space.lg },
  fact: { minWidth: 150, gap: 2 },
  row: { borderBottomWidth: 1, borderBottomColor: colors.line, paddingVertical: space.xs, gap: 2 },
});
