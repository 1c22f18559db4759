// Form inputs wired to react-hook-form by field path, with errors from the record form.
import { Controller, type FieldPath } from 'react-hook-form';

import { Checkbox } from '@/components/ui/checkbox';
import { ChoiceField } from '@/components/ui/choice-field';
import { TextField } from '@/components/ui/text-field';

import { useRecordForm } from './form-context';
import type { FormValues } from './form-values';

type Name = FieldPath<FormValues>;

export function TextInputField({
  name,
  label,
  hint,
  numeric,
  multiline,
}: {
  name: Name;
  label: string;
  hint?: string;
  numeric?: 'decimal' | 'numeric';
  multiline?: boolean;
}) {
  const { control, errors } = useRecordForm();
  return (
    <Controller
      control={control}
      name={name}
      render={({ field }) => (
        <TextField
          label={label}
          hint={hint}
          value={String(field.value ?? '')}
          onChangeText={field.onChange}
          onBlur={field.onBlur}
          inputMode={numeric}
          multiline={multiline}
          numberOfLines={multiline ? 3 : undefined}
          style={multiline ? { minHeight: 80, paddingTop: 8, textAlignVertical: 'top' } : undefined}
          error={errors[name]}
        />
      )}
    />
  );
}

export function ChoiceInputField<T extends string>({
  name,
  label,
  options,
}: {
  name: Name;
  label: string;
  options: { value: T; label: string }[];
}) {
  const { control, errors } = useRecordForm();
  return (
    <Controller
      control={control}
      name={name}
      render={({ field }) => (
        <ChoiceField<T>
          label={label}
          options={options}
          value={(field.value as T | null) ?? undefined}
          onChange={field.onChange}
          error={errors[name]}
        />
      )}
    />
  );
}

export function YesNoField({ name, label }: { name: Name; label: string }) {
  const { control, errors } = useRecordForm();
  return (
    <Controller
      control={control}
      name={name}
      render={({ field }) => (
        <ChoiceField<'yes' | 'no'>
          label={label}
          options={[
            { value: 'yes', label: 'Yes' },
            { value: 'no', label: 'No' },
          ]}
          value={field.value === true ? 'yes' : field.value === false ? 'no' : undefined}
          onChange={(v) => field.onChange(v === 'yes')}
          error={errors[name]}
        />
      )}
    />
  );
}

export function CheckboxField({ name, label, hint }: { name: Name; label: string; hint?: string }) {
  const { control } = useRecordForm();
  return (
    <Controller
      control={control}
      name={name}
      render={({ field }) => <Checkbox label={label} hint={hint} checked={Boolean(field.value)} onChange={field.onChange} />}
    />
  );
}

export const options = <T extends string>(values: readonly T[], labels: Record<T, string>) =>
  values.map((value) => ({ value, label: labels[value] }));
