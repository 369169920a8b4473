import type { TemplateRequest, TemplateView } from '@driftmark/shared';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api, type WithAbilities } from '@/lib/api-client';
import { templateKeys } from './keys';
import { templatePath } from './template-path';

/** PUT /api/countdown-templates/:templateId (owner, coach): replaces the template. */
export function updateTemplate(templateId: string, body: TemplateRequest): Promise<TemplateView> {
  return api.put<TemplateView>(templatePath(templateId), body);
}

export function useUpdateTemplate(
  templateId: string,
  options: { onSuccess?: (template: TemplateView) => void } = {},
) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: TemplateRequest) => updateTemplate(templateId, body),
    onSuccess: async (template) => {
      queryClient.setQueryData<WithAbilities<TemplateView>>(templateKeys.detail(templateId), (prev) => ({
        data: template,
        abilities: prev?.abilities ?? { manage: true },
      }));
      await Promise.all([
        queryClient.invalidateQueries({ queryKey: templateKeys.detail(templateId) }),
        queryClient.invalidateQueries({ queryKey: templateKeys.list() }),
      ]);
      options.onSuccess?.(template);
    },
  });
}
