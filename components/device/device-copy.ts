// Pages a technician opened are kept on the device, so the job and its record open in a
// basement with no signal. Online, the server's answer always wins and refreshes the copy.
import { ApiError } from '@/components/lib/api-client';

import { deviceKey, readDevice, writeDevice } from './device-store';

let currentUserId: number | null = null;

// Set by the session query: copies belong to one user and are never read for another.
export function setDeviceUser(userId: number | null) {
  currentUserId = userId;
}

export async function withDeviceCopy<T>(path: string, load: () => Promise<T>): Promise<T> {
  const userId = currentUserId;
  try {
    const fresh = await load();
    if (userId !== null) void writeDevice(deviceKey.copy(userId, path), fresh);
    return fresh;
  } catch (error) {
    if (userId !== null && error instanceof ApiError && error.status === 0) {
      const copy = await readDevice<T>(deviceKey.copy(userId, path));
      if (copy !== undefined) return copy;
    }
    throw error;
  }
}

// After a save, the kept copy of a page is brought up to date, so the page opens offline at
// the version the server now holds.
export async function refreshDeviceCopy(path: string, value: unknown): Promise<void> {
  if (currentUserId !== null) await writeDevice(deviceKey.copy(currentUserId, path), value);
}
