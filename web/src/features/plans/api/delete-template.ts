import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { templateKeys } from './keys';
import { templatePath } from './template-path';

/**
 * DELETE /api/countdown-templates/:templateId (owner, coach). Plan versions made from it keep their
 * days and the template's name; only the library entry goes.
 */
export function deleteTemplate(templateId: string): Promise<void> {
  return api.delete(templatePath(templateId));
}

export function useDeleteTemplate(options: { onSuccess?: () => void } = {}) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: deleteTemplate,
    onSuccess: async (_data, templateId) => {
      // Marked stale without a refetch: the open page is leaving, and a refetch would only answer 404.
      await Promise.all([
        queryClient.invalidateQueries({ queryKey: templateKeys.detail(templateId), refetchType: 'none' }),
        queryClient.invalidateQueries({ queryKey: templateKeys.list() }),
      ]);
      options.onSuccess?.();
    },
  });
}
