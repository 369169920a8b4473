import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { afterMeasurementWrite, type MeasurementWriteOptions } from './body-composition-cache';
import { bodyCompositionPath } from './get-body-composition';

/** DELETE /api/athletes/:athleteId/body-measurements/:measurementId. */
export function deleteBodyMeasurement(athleteId: string, measurementId: string): Promise<void> {
  return api.delete(
    bodyCompositionPath(athleteId, `/body-measurements/${encodeURIComponent(measurementId)}`),
  );
}

export function useDeleteBodyMeasurement(athleteId: string, options: MeasurementWriteOptions<string> = {}) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (measurementId: string) => deleteBodyMeasurement(athleteId, measurementId),
    onSuccess: async (_data, measurementId) => {
      await afterMeasurementWrite(queryClient, athleteId, options.linkedKeys);
      options.onSuccess?.(measurementId);
    },
  });
}
