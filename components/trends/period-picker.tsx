import { StyleSheet, View } from 'react-native';

import { useRubricsQuery } from '@/components/queries/rubrics';
import type { Period } from '@/components/queries/trends';
import { ChoiceField } from '@/components/ui/choice-field';
import { Select } from '@/components/ui/select';
import { space } from '@/components/ui/theme';
import { weekSpan } from '@/shared/trends';

const SPANS = [
  { value: '4', label: 'Last 4 weeks' },
  { value: '12', label: 'Last 12 weeks' },
  { value: '26', label: 'Last 26 weeks' },
];

// The last N whole weeks, this one included: trends are kept per Monday-to-Sunday week.
export function periodFor(weeks: number): Period {
  const today = new Date().toISOString().slice(0, 10);
  const { from } = weekSpan(today, today);
  const start = new Date(Date.parse(`${from}T00:00:00Z`) - (weeks - 1) * 7 * 86_400_000).toISOString().slice(0, 10);
  const span = weekSpan(start, today);
  return { from: span.from, to: span.to };
}

export function PeriodPicker({
  weeks,
  rubricVersion,
  onChange,
  showRubric = true,
}: {
  weeks: string;
  rubricVersion: string;
  onChange: (changes: { weeks?: string; rubricVersion?: string }) => void;
  showRubric?: boolean;
}) {
  const rubrics = useRubricsQuery();
  return (
    <View style={styles.row}>
      <ChoiceField<string> label="Period" options={SPANS} value={weeks} onChange={(w) => onChange({ weeks: w })} />
      {showRubric ? (
        <Select
          label="Rubric version"
          value={rubricVersion}
          allLabel="All versions"
          options={(rubrics.data ?? []).map((r) => ({ value: String(r.version), label: `Version ${r.version}` }))}
          onChange={(v) => onChange({ rubricVersion: v })}
        />
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({ row: { flexDirection: 'row', flexWrap: 'wrap', gap: space.lg, alignItems: 'flex-end' } });
