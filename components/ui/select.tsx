import { ChoiceField } from './choice-field';

export type SelectProps<T extends string> = {
  label: string;
  value: T | '';
  options: { value: T; label: string }[];
  onChange: (value: T | '') => void;
  allLabel?: string;
};

// On phones a compact select is a row of choices; the web build uses a native <select>.
export function Select<T extends string>({ label, value, options, onChange, allLabel = 'All' }: SelectProps<T>) {
  return (
    <ChoiceField<T | '__all'>
      label={label}
      options={[{ value: '__all', label: allLabel }, ...options]}
      value={value === '' ? '__all' : value}
      onChange={(v) => onChange(v === '__all' ? '' : (v as T))}
    />
  );
}
