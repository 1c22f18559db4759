// Step 3: where to start, and the rooms in a rough order, each with its level and rough size.
// The rooms named here start the capture record's room list.
import { StyleSheet, View } from 'react-native';

import { Button } from '@/components/ui/button';
import { ChoiceField } from '@/components/ui/choice-field';
import { Text } from '@/components/ui/text';
import { TextField } from '@/components/ui/text-field';
import { colors, space } from '@/components/ui/theme';
import { LEVEL_LABELS, type LevelKind } from '@/shared/capture-record';
import type { LengthUnit } from '@/shared/units';
import type { VisitPlan } from '@/shared/visit-plan';
import { startAdvice, suggestStartLevel } from '@/shared/visit-suggestions';

import { emptyPlanRoom, type PlanValues, type RoomValues } from './plan-values';

type Props = {
  values: PlanValues;
  plan: VisitPlan;
  errors: Record<string, string>;
  change: (next: Partial<PlanValues>) => void;
};

const ROOM_LEVELS: LevelKind[] = ['basement', 'ground', 'upper', 'attic', 'crawl_space'];
const levelOptions = ROOM_LEVELS.map((l) => ({ value: l, label: LEVEL_LABELS[l] }));

export function RoomsStep({ values, plan, errors, change }: Props) {
  const suggested = suggestStartLevel(plan);
  const rooms = values.rooms;
  const setRooms = (next: RoomValues[]) => change({ rooms: next });
  const update = (key: string, patch: Partial<RoomValues>) => setRooms(rooms.map((r) => (r.key === key ? { ...r, ...patch } : r)));
  const move = (index: number, by: number) => {
    const next = [...rooms];
    const [room] = next.splice(index, 1);
    next.splice(index + by, 0, room);
    setRooms(next);
  };
  const lastLevel = rooms.at(-1)?.level ?? values.startLevel ?? suggested ?? 'ground';

  return (
    <View style={styles.step}>
      <Text>{startAdvice(suggested)}</Text>
      <ChoiceField<LevelKind>
        label="Start on"
        options={levelOptions}
        value={values.startLevel ?? suggested ?? undefined}
        onChange={(startLevel) => change({ startLevel })}
      />
      <ChoiceField<LengthUnit>
        label="Rough sizes in"
        options={[
          { value: 'ft', label: 'feet' },
          { value: 'm', label: 'metres' },
        ]}
        value={values.units}
        onChange={(units) => change({ units })}
      />
      <Text variant="heading" role="heading" aria-level={3}>
        {`Rooms in order (${rooms.length})`}
      </Text>
      {rooms.map((room, i) => {
        const label = room.name.trim() || `Room ${i + 1}`;
        return (
          <View key={room.key} style={styles.card} role="group" aria-label={`Room ${i + 1}: ${label}`}>
            <TextField label={`Room ${i + 1} name`} value={room.name} onChangeText={(name) => update(room.key, { name })} maxLength={80} />
            <ChoiceField<LevelKind>
              label={`Level of ${label}`}
              options={levelOptions}
              value={room.level}
              onChange={(level) => update(room.key, { level })}
            />
            <View style={styles.sizes}>
              <View style={styles.size}>
                <TextField
                  label={`${label} length (${values.units})`}
                  value={room.length}
                  onChangeText={(length) => update(room.key, { length })}
                  inputMode="decimal"
                  error={errors[`rooms.${i}.length`]}
                />
              </View>
              <View style={styles.size}>
                <TextField
                  label={`${label} width (${values.units})`}
                  value={room.width}
                  onChangeText={(width) => update(room.key, { width })}
                  inputMode="decimal"
                  error={errors[`rooms.${i}.width`]}
                />
              </View>
            </View>
            <View style={styles.actions}>
              {i > 0 ? <Button label={`Move ${label} up`} tone="secondary" onPress={() => move(i, -1)} /> : null}
              {i < rooms.length - 1 ? <Button label={`Move ${label} down`} tone="secondary" onPress={() => move(i, 1)} /> : null}
              <Button label={`Remove ${label}`} tone="secondary" onPress={() => setRooms(rooms.filter((r) => r.key !== room.key))} />
            </View>
          </View>
        );
      })}
      <Button label="Add a room" tone="secondary" onPress={() => setRooms([...rooms, emptyPlanRoom(lastLevel)])} />
    </View>
  );
}

const styles = StyleSheet.create({
  step: { gap: space.md },
  card: { gap: space.sm, borderWidth: 1, borderColor: colors.line, borderRadius: 8, padding: space.md, backgroundColor: colors.surface },
  sizes: { flexDirection: 'row', gap: space.md, flexWrap: 'wrap' },
  size: { flexGrow: 1, flexBasis: 120 },
  actions: { flexDirection: 'row', flexWrap: 'wrap', gap: space.sm },
});
