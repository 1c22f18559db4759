// Keeps a draft safe (a capture record, a visit plan): every change is written to this phone
// at once, then sent to the server with the version it was based on. The status always says
// what is true: saved, saving, kept on this phone while offline, refused fields, or a conflict
// to resolve.
import { useCallback, useEffect, useRef, useState } from 'react';
import { AppState } from 'react-native';

import { readDevice, removeDevice, writeDevice } from '@/components/device/device-store';
import { useOnline } from '@/components/device/use-online';
import { ApiError } from '@/components/lib/api-client';

// The server's copy of a draft: the document under its own name, its version and save time.
export type ServerDraft = { version: number; savedAt: string | null };

export type SyncStatus<S extends ServerDraft = ServerDraft> =
  | { kind: 'saved'; savedAt: string | null }
  | { kind: 'pending' }
  | { kind: 'saving' }
  | { kind: 'offline'; changes: number; kept: boolean }
  | { kind: 'conflict'; theirs: S }
  | { kind: 'error'; message: string };

// What this phone keeps while a change is not yet on the server.
export type LocalDraft<V> = { values: V; baseVersion: number; changes: number; updatedAt: string };

type Saved = { version: number; savedAt: string };

export type DraftSyncOptions<S extends ServerDraft, D, V> = {
  // Where this device keeps unsent edits (scoped to the user, see deviceKey).
  storageKey: string;
  server: S;
  values: V;
  toDoc: (values: V) => D;
  docOf: (server: S) => D;
  save: (doc: D, baseVersion: number) => Promise<Saved>;
  // Puts values into the form without counting them as a new change.
  replaceValues: (values: V) => void;
  // Two versions holding the same facts need no choice (the same edit arrived twice).
  sameFacts: (a: D, b: D) => boolean;
  // For a refusal naming fields: the document without them (null if nothing is left to save)
  // and the fields to mark, in the form's names. Without it a refusal is only reported.
  dropRefused?: (doc: D, fields: Record<string, string>) => { rest: D | null; marked: Record<string, string> };
  // The opening values are not the server's (a record filled from the visit plan): they count
  // as a change and are saved, unless this phone kept edits of its own.
  startsChanged?: boolean;
};

const DEBOUNCE_MS = 1200;
const RETRY_MS = 8000;
const OFFLINE_RETRY_MS = 5000;

export function useDraftSync<S extends ServerDraft, D, V>({
  storageKey: key,
  server,
  values,
  toDoc,
  docOf,
  save,
  replaceValues,
  sameFacts,
  dropRefused,
  startsChanged = false,
}: DraftSyncOptions<S, D, V>) {
  const [status, setStatus] = useState<SyncStatus<S>>({ kind: 'saved', savedAt: server.savedAt });
  const [refused, setRefused] = useState<Record<string, string>>({});
  const [mine, setMine] = useState<V | null>(null);
  const online = useOnline();

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
    const local: LocalDraft<V> = {
      values: latest.current,
      baseVersion: baseVersion.current,
      changes: changes.current,
      updatedAt: new Date().toISOString(),
    };
    kept.current = await writeDevice(key, local);
  }, [key]);

  const enterConflict = useCallback(
    (theirs: S) => {
      // The other save holds the same facts as this phone (the same edit arrived twice, e.g. a
      // save that reached the server while the phone thought it offline): nothing to choose.
      if (sameFacts(docOf(theirs), toDoc(latest.current))) {
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
    [key, toDoc, docOf, sameFacts],
  );

  const sendOnce = useCallback(async () => {
    const sentSerial = JSON.stringify(latest.current);
    const doc = toDoc(latest.current);
    setStatus({ kind: 'saving' });
    try {
      let result: Saved;
      try {
        result = await save(doc, baseVersion.current);
        setRefused({});
      } catch (error) {
        // The server refused some fields: mark them, and save everything else without them.
        if (!(error instanceof ApiError) || error.code !== 'invalid_input') throw error;
        const dropped = dropRefused?.(doc, error.fields) ?? { rest: null, marked: error.fields };
        setRefused(dropped.marked);
        if (!dropped.rest) throw error;
        result = await save(dropped.rest, baseVersion.current);
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
        enterConflict((error.body as { current: S }).current);
      } else if (error instanceof ApiError && error.status === 0) {
        setStatus({ kind: 'offline', changes: changes.current, kept: kept.current });
      } else if (error instanceof ApiError && error.code === 'invalid_input') {
        setStatus({ kind: 'error', message: 'Some fields were refused; correct the marked fields' });
      } else {
        setStatus({ kind: 'error', message: error instanceof Error ? error.message : 'Not saved' });
        timer.current = setTimeout(() => retry.current(), RETRY_MS);
      }
    }
  }, [dropRefused, enterConflict, keepOnDevice, key, save, toDoc]);

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
    void readDevice<LocalDraft<V>>(key).then((local) => {
      if (cancelled) return;
      ready.current = true;
      if (!local || local.changes === 0) {
        if (!startsChanged) return;
        changes.current = 1;
        void keepOnDevice();
        setStatus({ kind: 'pending' });
        timer.current = setTimeout(() => retry.current(), DEBOUNCE_MS);
        return;
      }
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
    async (theirValues: V) => {
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

export function describeSync(status: SyncStatus<ServerDraft>, problems: number): string {
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
