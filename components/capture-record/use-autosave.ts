import { useCallback, useEffect, useRef, useState } from 'react';
import { AppState } from 'react-native';

import type { CaptureRecord } from '@/shared/capture-record';

export type AutosaveState =
  | { status: 'idle' | 'pending' | 'saving' }
  | { status: 'saved'; savedAt: string }
  | { status: 'blocked' }
  | { status: 'error'; message: string };

const DEBOUNCE_MS = 1200;
const RETRY_MS = 5000;

// Saves the draft shortly after typing stops, at once when the app goes to the background
// (a phone screen turning off), and again and again after a failure until it succeeds.
export function useAutosave(record: CaptureRecord, blocked: boolean, save: (record: CaptureRecord) => Promise<{ savedAt: string }>) {
  const [state, setState] = useState<AutosaveState>({ status: 'idle' });
  const latest = useRef(record);
  const dirty = useRef(false);
  const retry = useRef<ReturnType<typeof setTimeout> | null>(null);
  const serialized = JSON.stringify(record);
  const [first] = useState(serialized);
  const flushLater = useRef<() => void>(() => undefined);

  useEffect(() => {
    latest.current = record;
  });

  const flush = useCallback(async () => {
    if (!dirty.current) return;
    if (retry.current) clearTimeout(retry.current);
    dirty.current = false;
    setState({ status: 'saving' });
    try {
      const result = await save(latest.current);
      setState({ status: 'saved', savedAt: result.savedAt });
    } catch (error) {
      dirty.current = true;
      setState({ status: 'error', message: (error as Error).message });
      retry.current = setTimeout(() => flushLater.current(), RETRY_MS);
    }
  }, [save]);

  useEffect(() => {
    flushLater.current = () => void flush();
  }, [flush]);

  useEffect(() => {
    if (serialized === first) return;
    dirty.current = true;
    // The status must say "not saved" the moment the record changes, not after the debounce.
    // eslint-disable-next-line react-hooks/set-state-in-effect
    setState({ status: blocked ? 'blocked' : 'pending' });
    if (blocked) return;
    const timer = setTimeout(() => void flush(), DEBOUNCE_MS);
    return () => clearTimeout(timer);
  }, [serialized, first, blocked, flush]);

  useEffect(() => {
    const subscription = AppState.addEventListener('change', (next) => {
      if (next !== 'active' && !blocked) void flush();
    });
    return () => {
      subscription.remove();
      if (retry.current) clearTimeout(retry.current);
    };
  }, [flush, blocked]);

  return { state, flush };
}

export function describeAutosave(state: AutosaveState): string {
  switch (state.status) {
    case 'idle':
      return 'All changes saved';
    case 'pending':
      return 'Unsaved changes…';
    case 'saving':
      return 'Saving…';
    case 'saved':
      return `Saved at ${new Date(state.savedAt).toLocaleTimeString([], { hour: '2-digit', minute: '2-digit' })}`;
    case 'blocked':
      return 'Not saved yet: correct the field marked in red';
    case 'error':
      return `Not saved (${state.message}). Retrying…`;
  }
}
