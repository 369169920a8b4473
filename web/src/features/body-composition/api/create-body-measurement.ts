import type { BodyMeasurementView, CreateBodyMeasurementRequest } from '@driftmark/shared';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { afterMeasurementWrite, type MeasurementWriteOptions } from './body-composition-cache';
import { bodyCompositionPath } from './get-body-composition';

/** POST /api/athletes/:athleteId/body-measurements (the athlete, or staff working on them). */
export function createBodyMeasurement(
  athleteId: string,
  body: CreateBodyMeasurementRequest,
): Promise<BodyMeasurementView> {
  return api.post<BodyMeasurementView>(bodyCompositionPath(athleteId, '/body-measurements'), body);
}

export function useCreateBodyMeasurement(
  athleteId: string,
  options: MeasurementWriteOptions<BodyMeasurementView> = {},
) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: CreateBodyMeasurementRequest) => createBodyMeasurement(athleteId, body),
    onSuccess: async (measurement) => {
      await afterMeasurementWrite(queryClient, athleteId, options.linkedKeys);
      options.onSuccess?.(measurement);
    },
  });
}
