// Keeps a capture record draft safe: every change is written to this phone at once, then sent
// to the server with the version it was based on. The status always says what is true: saved,
// saving, kept on this phone while offline, refused fields, or a conflict to resolve.
import { useCallback, useEffect, useRef, useState } from 'react';
import { AppState } from 'react-native';

import { deviceKey, readDevice, removeDevice, writeDevice } from '@/components/device/device-store';
import { useOnline } from '@/components/device/use-online';
import { ApiError } from '@/components/lib/api-client';
import type { CaptureRecord } from '@/shared/capture-record';
import { diffRevisions } from '@/shared/revision-diff';

import type { FormValues } from './form-values';
import { toFormFields, withoutRefused } from './server-fields';

export type DraftVersion = { record: CaptureRecord; version: number; savedAt: string | null };

export type SyncStatus =
  | { kind: 'saved'; savedAt: string | null }
  | { kind: 'pending' }
  | { kind: 'saving' }
  | { kind: 'offline'; changes: number; kept: boolean }
  | { kind: 'conflict'; theirs: DraftVersion }
  | { kind: 'error'; message: string };

// What this phone keeps while a change is not yet on the server.
export type LocalDraft = { values: FormValues; baseVersion: number; changes: number; updatedAt: string };

type SaveRecord = (record: CaptureRecord, baseVersion: number) => Promise<{ version: number; savedAt: string }>;

type Options = {
  jobId: number;
  userId: number;
  server: DraftVersion;
  values: FormValues;
  toRecord: (values: FormValues) => CaptureRecord;
  saveRecord: SaveRecord;
  // Puts values into the form without counting them as a new change.
  replaceValues: (values: FormValues) => void;
};

const DEBOUNCE_MS = 1200;
const RETRY_MS = 8000;
const OFFLINE_RETRY_MS = 5000;

export function useRecordSync({ jobId, userId, server, values, toRecord, saveRecord, replaceValues }: Options) {
  const [status, setStatus] = useState<SyncStatus>({ kind: 'saved', savedAt: server.savedAt });
  const [refused, setRefused] = useState<Record<string, string>>({});
  const [mine, setMine] = useState<FormValues | null>(null);
  const online = useOnline();
  const key = deviceKey.draft(userId, jobId);

  const baseVersion = useRef(server.version);
  const changes = useRef(0);
  const kept = useRef(true);
  const latest = useRef(values);
  const seen = useRef(JSON.stringify(values));
  const ready = useRef(false);
  const inConflict = useRef(false);
  const sending = useRef<Promise<void> | null>(null);
  const timer = useRef<ReturnType<typeof setTimeout> | null>(null);
  const retry = useRef<() => void>(() => undefined);

  const keepOnDevice = useCallback(async () => {
    const local: LocalDraft = {
      values: latest.current,
      baseVersion: baseVersion.current,
      changes: changes.current,
      updatedAt: new Date().toISOString(),
    };
    kept.current = await writeDevice(key, local);
  }, [key]);

  const enterConflict = useCallback(
    (theirs: DraftVersion) => {
      // The other save holds the same facts as this phone (the same edit arrived twice, e.g. a
      // save that reached the server while the phone thought it offline): nothing to choose.
      if (diffRevisions({ record: theirs.record, files: [] }, { record: toRecord(latest.current), files: [] }).length === 0) {
        baseVersion.current = theirs.version;
        changes.current = 0;
        void removeDevice(key);
        setStatus({ kind: 'saved', savedAt: theirs.savedAt });
        return;
      }
      inConflict.current = true;
      setMine(latest.current);
      setStatus({ kind: 'conflict', theirs });
    },
    [key, toRecord],
  );

  const sendOnce = useCallback(async () => {
    const sentSerial = JSON.stringify(latest.current);
    const record = toRecord(latest.current);
    setStatus({ kind: 'saving' });
    try {
      let result: { version: number; savedAt: string };
      try {
        result = await saveRecord(record, baseVersion.current);
        setRefused({});
      } catch (error) {
        // The server refused some fields: mark them, and save everything else without them.
        if (!(error instanceof ApiError) || error.code !== 'invalid_input') throw error;
        const rest = withoutRefused(record, Object.keys(error.fields));
        setRefused(toFormFields(error.fields, record));
        if (!rest) throw error;
        result = await saveRecord(rest, baseVersion.current);
      }
      baseVersion.current = result.version;
      if (JSON.stringify(latest.current) === sentSerial) {
        changes.current = 0;
        await removeDevice(key);
        setStatus({ kind: 'saved', savedAt: result.savedAt });
      } else {
        await keepOnDevice();
        setStatus({ kind: 'pending' });
        timer.current = setTimeout(() => retry.current(), DEBOUNCE_MS);
      }
    } catch (error) {
      if (error instanceof ApiError && error.code === 'stale_version') {
        enterConflict((error.body as { current: DraftVersion }).current);
      } else if (error instanceof ApiError && error.status === 0) {
        setStatus({ kind: 'offline', changes: changes.current, kept: kept.current });
      } else if (error instanceof ApiError && error.code === 'invalid_input') {
        setStatus({ kind: 'error', message: 'Some fields were refused; correct the marked fields' });
      } else {
        setStatus({ kind: 'error', message: error instanceof Error ? error.message : 'Not saved' });
        timer.current = setTimeout(() => retry.current(), RETRY_MS);
      }
    }
  }, [enterConflict, keepOnDevice, key, saveRecord, toRecord]);

  // Sends the latest values now, unless nothing changed or a conflict waits for the technician.
  const flush = useCallback(async () => {
    if (timer.current) clearTimeout(timer.current);
    timer.current = null;
    if (sending.current) await sending.current;
    if (changes.current === 0 || inConflict.current) return;
    sending.current = sendOnce().finally(() => {
      sending.current = null;
    });
    await sending.current;
  }, [sendOnce]);

  useEffect(() => {
    retry.current = () => void flush();
  }, [flush]);

  // On opening: edits this phone kept from an earlier visit come back. If the server's draft
  // moved on meanwhile (another device saved), the technician chooses.
  useEffect(() => {
    let cancelled = false;
    void readDevice<LocalDraft>(key).then((local) => {
      if (cancelled) return;
      ready.current = true;
      if (!local || local.changes === 0) return;
      changes.current = local.changes;
      latest.current = local.values;
      seen.current = JSON.stringify(local.values);
      replaceValues(local.values);
      if (local.baseVersion === server.version) {
        setStatus({ kind: 'pending' });
        timer.current = setTimeout(() => retry.current(), 0);
      } else {
        enterConflict(server);
      }
    });
    return () => {
      cancelled = true;
    };
    // Only on opening: later server versions come through saves, not through this.
    // eslint-disable-next-line react-hooks/exhaustive-deps
  }, [key]);

  // Every change: kept on the phone at once, sent after a pause in typing.
  useEffect(() => {
    const serial = JSON.stringify(values);
    if (!ready.current || serial === seen.current) return;
    seen.current = serial;
    latest.current = values;
    changes.current += 1;
    void keepOnDevice();
    if (inConflict.current) return;

    setStatus({ kind: 'pending' });
    if (timer.current) clearTimeout(timer.current);
    timer.current = setTimeout(() => retry.current(), DEBOUNCE_MS);
  }, [values, keepOnDevice]);

  // Back online: send what was kept. Browsers do not always announce the connection coming
  // back, so while offline the phone also tries again every few seconds.
  useEffect(() => {
    if (online && changes.current > 0 && !inConflict.current) retry.current();
  }, [online]);
  useEffect(() => {
    if (status.kind !== 'offline') return;
    const interval = setInterval(() => retry.current(), OFFLINE_RETRY_MS);
    return () => clearInterval(interval);
  }, [status.kind]);

  // Leaving the page or the app sends what is pending; closing the tab with changes that this
  // phone could not keep asks first.
  useEffect(() => {
    const subscription = AppState.addEventListener('change', (next) => {
      if (next !== 'active') retry.current();
    });
    const beforeUnload = (event: BeforeUnloadEvent) => {
      if (changes.current > 0 && !kept.current) event.preventDefault();
    };
    if (typeof window !== 'undefined' && window.addEventListener) window.addEventListener('beforeunload', beforeUnload);
    return () => {
      subscription.remove();
      if (typeof window !== 'undefined' && window.removeEventListener) window.removeEventListener('beforeunload', beforeUnload);
      retry.current();
    };
  }, []);

  const keepMine = useCallback(async () => {
    if (status.kind !== 'conflict') return;
    baseVersion.current = status.theirs.version;
    inConflict.current = false;
    setMine(null);
    changes.current = Math.max(changes.current, 1);
    await keepOnDevice();
    await flush();
  }, [flush, keepOnDevice, status]);

  const useTheirs = useCallback(
    async (theirValues: FormValues) => {
      if (status.kind !== 'conflict') return;
      baseVersion.current = status.theirs.version;
      inConflict.current = false;
      setMine(null);
      changes.current = 0;
      latest.current = theirValues;
      seen.current = JSON.stringify(theirValues);
      replaceValues(theirValues);
      await removeDevice(key);
      setStatus({ kind: 'saved', savedAt: status.theirs.savedAt });
    },
    [key, replaceValues, status],
  );

  // Submitting sends the same record with the same version rule; afterwards nothing is pending.
  const submitted = useCallback(
    async (recordVersion: number) => {
      baseVersion.current = recordVersion;
      changes.current = 0;
      await removeDevice(key);
    },
    [key],
  );

  return {
    status,
    refused,
    mine,
    flush,
    keepMine,
    useTheirs,
    submitted,
    enterConflict,
    baseVersion: () => baseVersion.current,
  };
}

const time = (iso: string) => new Date(iso).toLocaleTimeString([], { hour: '2-digit', minute: '2-digit' });

export function describeSync(status: SyncStatus, problems: number): string {
  const attention = problems ? `${problems} field${problems === 1 ? ' needs' : 's need'} attention` : '';
  const main = (() => {
    switch (status.kind) {
      case 'saved':
        return status.savedAt ? `Saved ${time(status.savedAt)}` : 'Nothing changed yet';
      case 'pending':
        return 'Not saved yet — saving in a moment';
      case 'saving':
        return 'Saving…';
      case 'offline':
        return status.kept
          ? `Offline — ${status.changes} change${status.changes === 1 ? '' : 's'} kept on this phone`
          : `Offline — ${status.changes} change${status.changes === 1 ? '' : 's'} not saved; keep this page open`;
      case 'conflict':
        return 'Conflict — choose a version';
      case 'error':
        return `Not saved: ${status.message}. Trying again…`;
    }
  })();
  return attention && status.kind !== 'conflict' ? `${attention} · ${main}` : main;
}
