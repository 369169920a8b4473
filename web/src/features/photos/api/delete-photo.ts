import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { photoKeys } from './keys';

/** DELETE /api/photos/:photoId (the athlete themself): the row and both stored sizes. */
export function deletePhoto(photoId: string): Promise<void> {
  return api.delete(`/api/photos/${encodeURIComponent(photoId)}`);
}

export function useDeletePhoto(athleteId: string, options: { onSuccess?: () => void } = {}) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: deletePhoto,
    onSuccess: async () => {
      await queryClient.invalidateQueries({ queryKey: photoKeys.athlete(athleteId) });
      options.onSuccess?.();
    },
  });
}
