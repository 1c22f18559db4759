// The capture record's draft sync: the shared draft sync with the record's own parts — its
// device key, its diff for "same facts", and the mapping of refused server fields onto the form.
import { useCallback } from 'react';

import { deviceKey } from '@/components/device/device-store';
import { useDraftSync } from '@/components/device/use-draft-sync';
import type { CaptureRecord } from '@/shared/capture-record';
import { diffRevisions } from '@/shared/revision-diff';

import type { FormValues } from './form-values';
import { toFormFields, withoutRefused } from './server-fields';

export { describeSync, type SyncStatus } from '@/components/device/use-draft-sync';

export type DraftVersion = { record: CaptureRecord; version: number; savedAt: string | null };

type Options = {
  jobId: number;
  userId: number;
  server: DraftVersion;
  values: FormValues;
  toRecord: (values: FormValues) => CaptureRecord;
  saveRecord: (record: CaptureRecord, baseVersion: number) => Promise<{ version: number; savedAt: string }>;
  replaceValues: (values: FormValues) => void;
  startsChanged?: boolean;
};

const sameRecord = (a: CaptureRecord, b: CaptureRecord) => diffRevisions({ record: a, files: [] }, { record: b, files: [] }).length === 0;
const recordOf = (server: DraftVersion) => server.record;
const dropRefused = (record: CaptureRecord, fields: Record<string, string>) => ({
  rest: withoutRefused(record, Object.keys(fields)),
  marked: toFormFields(fields, record),
});

export function useRecordSync({ jobId, userId, server, values, toRecord, saveRecord, replaceValues, startsChanged }: Options) {
  const toDoc = useCallback((v: FormValues) => toRecord(v), [toRecord]);
  return useDraftSync<DraftVersion, CaptureRecord, FormValues>({
    storageKey: deviceKey.draft(userId, jobId),
    server,
    values,
    toDoc,
    docOf: recordOf,
    save: saveRecord,
    replaceValues,
    sameFacts: sameRecord,
    dropRefused,
    startsChanged,
  });
}
