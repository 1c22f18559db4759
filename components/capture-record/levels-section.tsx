import { Controller, useWatch } from 'react-hook-form';
import { View } from 'react-native';

import { Checkbox } from '@/components/ui/checkbox';
import { Section } from '@/components/ui/section';
import { space } from '@/components/ui/theme';
import { LEVEL_KINDS, LEVEL_LABELS } from '@/shared/capture-record';
import { levelStationsLabel } from '@/shared/record-labels';

import { TextInputField } from './controlled';
import { useRecordForm } from './form-context';

export function LevelsSection() {
  const { control } = useRecordForm();
  const levels = useWatch({ control, name: 'levels' });
  const captured = LEVEL_KINDS.filter((l) => levels[l].captured).map((l) => LEVEL_LABELS[l]);
  return (
    <Section title="Levels captured" summary={captured.length ? captured.join(', ') : 'None chosen yet'}>
      {LEVEL_KINDS.map((level) => (
        <View key={level} style={{ gap: space.xs }}>
          <Controller
            control={control}
            name={`levels.${level}.captured`}
            render={({ field }) => <Checkbox label={LEVEL_LABELS[level]} checked={field.value} onChange={field.onChange} />}
          />
          {levels[level].captured ? (
            <TextInputField name={`levels.${level}.stations`} label={levelStationsLabel(level)} numeric="numeric" />
          ) : null}
        </View>
      ))}
    </Section>
  );
}
