// What this device keeps between visits (IndexedDB through idb-keyval): the signed-in user,
// copies of the pages a technician opened, draft edits not yet sent, files chosen offline.
// Every key is scoped to the signed-in user, and sign-out clears the whole store.
import { clear, createStore, del, get, keys, set, type UseStore } from 'idb-keyval';

let store: UseStore | null | undefined;

function deviceStore(): UseStore | null {
  if (store === undefined) store = typeof indexedDB === 'undefined' ? null : createStore('sightline', 'kv');
  return store;
}

export const deviceAvailable = () => deviceStore() !== null;

export async function readDevice<T>(key: string): Promise<T | undefined> {
  const s = deviceStore();
  return s ? get<T>(key, s) : undefined;
}

// Resolves false when the device could not keep the value (private mode, storage full).
export async function writeDevice(key: string, value: unknown): Promise<boolean> {
  const s = deviceStore();
  if (!s) return false;
  try {
    await set(key, value, s);
    return true;
  } catch {
    return false;
  }
}

export async function removeDevice(key: string): Promise<void> {
  const s = deviceStore();
  if (s) await del(key, s);
}

export async function deviceKeys(prefix: string): Promise<string[]> {
  const s = deviceStore();
  if (!s) return [];
  return (await keys(s)).map(String).filter((k) => k.startsWith(prefix));
}

export async function clearDevice(): Promise<void> {
  const s = deviceStore();
  if (s) await clear(s);
}

export const deviceKey = {
  user: 'session:user',
  copy: (userId: number, path: string) => `copy:${userId}:${path}`,
  draft: (userId: number, jobId: number) => `draft:${userId}:${jobId}`,
  plan: (userId: number, jobId: number) => `plan:${userId}:${jobId}`,
  upload: (userId: number, id: string) => `upload:${userId}:${id}`,
  uploadPrefix: (userId: number) => `upload:${userId}:`,
};
