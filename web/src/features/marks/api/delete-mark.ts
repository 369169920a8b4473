import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { afterMarkWrite, markPath, type MarkWriteOptions } from './mark-cache';

/** DELETE /api/marks/:markId (the author only): the mark goes with its replies and read states. */
export function deleteMark(markId: string): Promise<void> {
  return api.delete(markPath(markId));
}

/** `onSuccess` receives the deleted mark's id (a chart focused on it lets go). */
export function useDeleteMark(athleteId: string, options: MarkWriteOptions<string> = {}) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: deleteMark,
    onSuccess: async (_data, markId) => {
      await afterMarkWrite(queryClient, athleteId, options.linkedKeys);
      options.onSuccess?.(markId);
    },
  });
}
