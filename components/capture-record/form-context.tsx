import { createContext, useContext } from 'react';
import type { Control } from 'react-hook-form';

import type { FormValues } from './form-values';

type RecordFormValue = {
  control: Control<FormValues>;
  // Field errors from parsing and from the server, by field path (rooms.0.name).
  errors: Record<string, string>;
  unitLabel: string;
};

export const RecordFormContext = createContext<RecordFormValue | null>(null);

export function useRecordForm() {
  const value = useContext(RecordFormContext);
  if (!value) throw new Error('useRecordForm outside RecordFormContext');
  return value;
}
