// A job's visit plan (a versioned draft, like the capture record) and the kit and timing per
// camera class. Both are kept on the device, so a plan opens and suggests offline.
import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { useCallback } from 'react';

import { refreshDeviceCopy, withDeviceCopy } from '@/components/device/device-copy';
import { api, ApiError } from '@/components/lib/api-client';
import { CAMERA_CLASSES, type CameraClass } from '@/shared/capture-record';
import { emptyVisitPlan, type VisitPlan } from '@/shared/visit-plan';
import { type CameraClassSettings, DEFAULT_CAMERA_CLASS_SETTINGS } from '@/shared/visit-settings';

export type PlanVersion = { plan: VisitPlan; version: number; savedAt: string | null };
export type CameraClassSettingsView = CameraClassSettings & { version: number };

async function offlineFallback<T>(load: Promise<T>, fallback: () => T): Promise<T> {
  try {
    return await load;
  } catch (error) {
    if (error instanceof ApiError && error.status === 0) return fallback();
    throw error;
  }
}

export const planKeys = {
  plan: (jobId: number) => ['visit-plan', jobId] as const,
  cameraClasses: ['camera-classes'] as const,
};

export function usePlanQuery(jobId: number, enabled = true) {
  return useQuery({
    queryKey: planKeys.plan(jobId),
    // Offline with no copy (the plan page never opened online): start an empty plan at version
    // 0. If someone planned meanwhile, the first save meets their version and a conflict.
    queryFn: () =>
      offlineFallback(
        withDeviceCopy(`/api/jobs/${jobId}/plan`, () => api.get<PlanVersion>(`/api/jobs/${jobId}/plan`)),
        (): PlanVersion => ({ plan: emptyVisitPlan(), version: 0, savedAt: null }),
      ),
    enabled: enabled && Number.isInteger(jobId) && jobId > 0,
  });
}

export function saveVisitPlan(jobId: number, plan: VisitPlan, baseVersion: number) {
  return api.put<{ version: number; savedAt: string }>(`/api/jobs/${jobId}/plan`, plan, { baseVersion });
}

// Saves, then keeps the cached plan and its copy on the device at the saved version, so the
// plan reopens (online or off) where the server is.
export function useSavePlan(jobId: number) {
  const queryClient = useQueryClient();
  return useCallback(
    async (plan: VisitPlan, baseVersion: number) => {
      const saved = await saveVisitPlan(jobId, plan, baseVersion);
      const current: PlanVersion = { plan, version: saved.version, savedAt: saved.savedAt };
      queryClient.setQueryData(planKeys.plan(jobId), current);
      await refreshDeviceCopy(`/api/jobs/${jobId}/plan`, current);
      return saved;
    },
    [jobId, queryClient],
  );
}

export function useCameraClassesQuery() {
  return useQuery({
    queryKey: planKeys.cameraClasses,
    queryFn: () =>
      offlineFallback(
        withDeviceCopy(
          '/api/camera-classes',
          async () => (await api.get<{ cameraClasses: CameraClassSettingsView[] }>('/api/camera-classes')).cameraClasses,
        ),
        () => CAMERA_CLASSES.map((c) => ({ ...DEFAULT_CAMERA_CLASS_SETTINGS[c], version: 0 })),
      ),
  });
}

export function useCameraClassMutation(cameraClass: CameraClass) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ values, baseVersion }: { values: Omit<CameraClassSettings, 'cameraClass'>; baseVersion: number }) =>
      api.put<{ settings: CameraClassSettingsView }>(`/api/camera-classes/${cameraClass}`, values, { baseVersion }),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: planKeys.cameraClasses }),
  });
}
