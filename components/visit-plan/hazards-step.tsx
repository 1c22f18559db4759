// Step 5: the hazards of this loss and property, each with its usual caution. What is ticked
// here carries into the capture record's safety section.
import { View } from 'react-native';

import { Checkbox } from '@/components/ui/checkbox';
import { Notice } from '@/components/ui/notice';
import { Text } from '@/components/ui/text';
import { space } from '@/components/ui/theme';
import { type Hazard, HAZARD_LABELS, HAZARDS } from '@/shared/capture-record';
import { LOSS_TYPE_LABELS, type LossType } from '@/shared/jobs';
import { DEFER, HAZARD_CAUTIONS, suggestedHazards } from '@/shared/visit-hazards';

import type { PlanValues } from './plan-values';

type Props = { values: PlanValues; lossType: LossType; change: (next: Partial<PlanValues>) => void };

export function HazardsStep({ values, lossType, change }: Props) {
  const suggested = suggestedHazards(lossType, values.structures);
  const ordered = [...suggested, ...HAZARDS.filter((h) => !suggested.includes(h))];
  const toggle = (hazard: Hazard, on: boolean) =>
    change({ hazards: on ? [...values.hazards, hazard] : values.hazards.filter((h) => h !== hazard) });
  return (
    <View style={{ gap: space.md }}>
      <Notice tone="caution">
        {`Sightline reminds; it does not judge what is safe. Do not enter a space you are unsure of: record a coverage gap instead. ${DEFER}`}
      </Notice>
      <Text>{`Tick what applies here. Listed first: what a ${LOSS_TYPE_LABELS[lossType].toLowerCase()} loss and this property usually bring.`}</Text>
      {ordered.map((hazard) => (
        <Checkbox
          key={hazard}
          label={`${HAZARD_LABELS[hazard]}${suggested.includes(hazard) ? ' (likely here)' : ''}`}
          hint={`${HAZARD_CAUTIONS[hazard]} ${DEFER}`}
          checked={values.hazards.includes(hazard)}
          onChange={(on) => toggle(hazard, on)}
        />
      ))}
    </View>
  );
}
