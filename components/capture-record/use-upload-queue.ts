// Files the technician picks are kept on this phone first, then uploaded with progress; while
// offline they wait and go up when the connection returns. A file that can never pass (too
// large, wrong type) is refused at once, with the limit named, and is never offered a retry.
import { useQueryClient } from '@tanstack/react-query';
import { useCallback, useEffect, useRef, useState } from 'react';

import { deviceKey, deviceKeys, readDevice, removeDevice, writeDevice } from '@/components/device/device-store';
import { useOnline } from '@/components/device/use-online';
import { api, ApiError } from '@/components/lib/api-client';
import { invalidateJob } from '@/components/queries/jobs';
import { type StoredFile, type UploadKind, uploadProblem } from '@/shared/files';

type Queued = { id: string; jobId: number; kind: UploadKind; name: string; blob: Blob; queuedAt: string };

export type UploadItem = {
  id: string;
  name: string;
  state: 'waiting' | 'uploading' | 'failed' | 'refused' | 'done';
  fraction: number;
  message?: string;
  // Only failures a retry can fix (no connection, a server hiccup) are retried.
  retryable: boolean;
};

// Worth retrying: no answer at all, a timeout, rate limiting or a server-side failure.
const retryable = (error: unknown) =>
  !(error instanceof ApiError) || error.status === 0 || error.status === 408 || error.status === 429 || error.status >= 500;

function sendFile(jobId: number, kind: UploadKind, name: string, blob: Blob, onProgress: (fraction: number) => void) {
  const form = new FormData();
  form.append('kind', kind);
  form.append('file', blob, name);
  return api.upload<{ file: StoredFile }>(`/api/jobs/${jobId}/files`, form, onProgress);
}

export function useUploadQueue(jobId: number, userId: number) {
  const queryClient = useQueryClient();
  const online = useOnline();
  const [items, setItems] = useState<UploadItem[]>([]);
  const running = useRef(false);
  const prefix = deviceKey.uploadPrefix(userId);

  const update = (id: string, patch: Partial<UploadItem>) =>
    setItems((all) => all.map((item) => (item.id === id ? { ...item, ...patch } : item)));

  const process = useCallback(async () => {
    if (running.current) return;
    running.current = true;
    try {
      for (const key of await deviceKeys(prefix)) {
        const queued = await readDevice<Queued>(key);
        if (!queued || queued.jobId !== jobId) continue;
        setItems((all) =>
          all.some((i) => i.id === queued.id)
            ? all
            : [...all, { id: queued.id, name: queued.name, state: 'waiting', fraction: 0, retryable: true }],
        );
        update(queued.id, { state: 'uploading', fraction: 0, message: undefined });
        try {
          await sendFile(jobId, queued.kind, queued.name, queued.blob, (fraction) => update(queued.id, { fraction }));
          await removeDevice(key);
          update(queued.id, { state: 'done', fraction: 1 });
          await invalidateJob(queryClient, jobId);
        } catch (error) {
          if (retryable(error)) {
            const offline = error instanceof ApiError && error.status === 0;
            update(queued.id, {
              state: offline ? 'waiting' : 'failed',
              retryable: true,
              message: offline ? 'Kept on this phone; it uploads when the connection returns.' : (error as Error).message,
            });
            if (offline) break;
          } else {
            await removeDevice(key);
            const message = error instanceof ApiError ? (error.fields.file ?? error.fields.kind ?? error.message) : 'Upload refused.';
            update(queued.id, { state: 'refused', retryable: false, message });
          }
        }
      }
    } finally {
      running.current = false;
    }
  }, [jobId, prefix, queryClient]);

  const add = useCallback(
    async (kind: UploadKind, name: string, blob: Blob) => {
      const id = `${Date.now().toString(36)}-${Math.random().toString(36).slice(2, 8)}`;
      const problem = uploadProblem(kind, { size: blob.size, type: blob.type });
      if (problem) {
        setItems((all) => [...all, { id, name, state: 'refused', fraction: 0, message: problem, retryable: false }]);
        return;
      }
      const kept = await writeDevice(deviceKey.upload(userId, id), {
        id,
        jobId,
        kind,
        name,
        blob,
        queuedAt: new Date().toISOString(),
      } satisfies Queued);
      if (!kept) {
        // This browser keeps nothing on the device: upload straight away instead.
        setItems((all) => [...all, { id, name, state: 'uploading', fraction: 0, retryable: true }]);
        try {
          await sendFile(jobId, kind, name, blob, (fraction) => update(id, { fraction }));
          update(id, { state: 'done', fraction: 1 });
          await invalidateJob(queryClient, jobId);
        } catch (error) {
          update(id, { state: retryable(error) ? 'failed' : 'refused', retryable: false, message: (error as Error).message });
        }
        return;
      }
      setItems((all) => [...all, { id, name, state: 'waiting', fraction: 0, retryable: true }]);
      await process();
    },
    [jobId, process, queryClient, userId],
  );

  const dismiss = (id: string) => setItems((all) => all.filter((item) => item.id !== id));

  useEffect(() => {
    if (online) void process();
  }, [online, process]);

  // Browsers do not always announce the connection coming back: while a file waits, try again.
  const waiting = items.some((item) => item.state === 'waiting');
  useEffect(() => {
    if (!waiting) return;
    const interval = setInterval(() => void process(), 5000);
    return () => clearInterval(interval);
  }, [waiting, process]);

  return { items, add, retry: process, dismiss };
}
