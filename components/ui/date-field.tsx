// A date or time typed as text (native builds); the web build uses the browser's own picker
// (date-field.web.tsx). Values are ISO: YYYY-MM-DD, HH:MM, or YYYY-MM-DDTHH:MM.
import { TextField } from './text-field';

export type DateFieldProps = {
  label: string;
  kind: 'date' | 'time' | 'datetime-local';
  value: string;
  onChange: (value: string) => void;
  onBlur?: () => void;
  error?: string;
  hint?: string;
  min?: string;
  max?: string;
};

const PLACEHOLDER = { date: 'YYYY-MM-DD', time: 'HH:MM', 'datetime-local': 'YYYY-MM-DDTHH:MM' } as const;

export function DateField({ label, kind, value, onChange, onBlur, error, hint }: DateFieldProps) {
  return (
    <TextField
      label={label}
      hint={hint}
      placeholder={PLACEHOLDER[kind]}
      value={value}
      onChangeText={onChange}
      onBlur={onBlur}
      error={error}
    />
  );
}
