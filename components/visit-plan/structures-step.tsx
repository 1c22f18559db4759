// Step 1: what stands on the property, whether each part is in the claim's scope, and whether
// it can be reached from inside the main structure.
import { StyleSheet, View } from 'react-native';

import { Button } from '@/components/ui/button';
import { Checkbox } from '@/components/ui/checkbox';
import { Text } from '@/components/ui/text';
import { TextField } from '@/components/ui/text-field';
import { colors, space } from '@/components/ui/theme';
import { LOSS_TYPE_LABELS, type LossType } from '@/shared/jobs';
import { PLAN_STRUCTURE_KINDS, PLAN_STRUCTURE_LABELS, type PlannedStructure, type PlanStructureKind } from '@/shared/visit-plan';
import { suggestInScope } from '@/shared/visit-suggestions';

import { newPlanKey, type PlanValues } from './plan-values';

type Props = {
  values: PlanValues;
  change: (next: Partial<PlanValues>) => void;
  lossType: LossType;
  accessNotes: string | null;
};

export function newStructure(kind: PlanStructureKind, lossType: LossType): PlannedStructure {
  return {
    key: newPlanKey('s'),
    kind,
    name: PLAN_STRUCTURE_LABELS[kind],
    // An attic hatch is inside; a detached building and an outside crawl-space door are not.
    reachableInside: kind === 'main_dwelling' || kind === 'attic',
    inScope: suggestInScope(kind, lossType),
    scopeNote: '',
  };
}

export function StructuresStep({ values, change, lossType, accessNotes }: Props) {
  const update = (key: string, patch: Partial<PlannedStructure>) =>
    change({ structures: values.structures.map((s) => (s.key === key ? { ...s, ...patch } : s)) });
  const remove = (key: string) => change({ structures: values.structures.filter((s) => s.key !== key) });
  const add = (kind: PlanStructureKind) => change({ structures: [...values.structures, newStructure(kind, lossType)] });

  return (
    <View style={styles.step}>
      <Text>{`${LOSS_TYPE_LABELS[lossType]} loss. The adjuster's notes and the loss decide what is in scope; confirm each part here.`}</Text>
      {accessNotes ? <Text variant="muted">{`Site access notes: ${accessNotes}`}</Text> : null}
      {values.structures.map((s, i) => {
        const label = s.name.trim() || PLAN_STRUCTURE_LABELS[s.kind];
        return (
          <View key={s.key} style={styles.card} role="group" aria-label={`Structure ${i + 1}: ${label}`}>
            <Text variant="label">{`${PLAN_STRUCTURE_LABELS[s.kind]}`}</Text>
            <TextField label={`Name (structure ${i + 1})`} value={s.name} onChangeText={(name) => update(s.key, { name })} maxLength={80} />
            <Checkbox label={`${label}: in the claim's scope`} checked={s.inScope} onChange={(inScope) => update(s.key, { inScope })} />
            {s.kind === 'main_dwelling' ? null : (
              <Checkbox
                label={`${label}: reached from inside the main structure`}
                hint="A door, a stair or a hatch: stations can link it without going outdoors."
                checked={s.reachableInside}
                onChange={(reachableInside) => update(s.key, { reachableInside })}
              />
            )}
            <TextField
              label={`Scope note (structure ${i + 1}, optional)`}
              value={s.scopeNote}
              onChangeText={(scopeNote) => update(s.key, { scopeNote })}
              maxLength={500}
            />
            <Button label={`Remove ${label}`} tone="secondary" onPress={() => remove(s.key)} />
          </View>
        );
      })}
      <Text variant="label">Add to the property</Text>
      <View style={styles.adds}>
        {PLAN_STRUCTURE_KINDS.filter((k) => k !== 'main_dwelling' || !values.structures.some((s) => s.kind === 'main_dwelling')).map(
          (kind) => (
            <Button key={kind} label={`Add ${PLAN_STRUCTURE_LABELS[kind].toLowerCase()}`} tone="secondary" onPress={() => add(kind)} />
          ),
        )}
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  step: { gap: space.md },
  card: { gap: space.sm, borderWidth: 1, borderColor: colors.line, borderRadius: 8, padding: space.md, backgroundColor: colors.surface },
  adds: { flexDirection: 'row', flexWrap: 'wrap', gap: space.sm },
});
