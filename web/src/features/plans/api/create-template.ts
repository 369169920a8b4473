import type { TemplateRequest, TemplateView } from '@driftmark/shared';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api, type WithAbilities } from '@/lib/api-client';
import { templateKeys } from './keys';
import { templatePath } from './template-path';

/** POST /api/countdown-templates (owner, coach): answers 201 with the new template. */
export function createTemplate(body: TemplateRequest): Promise<TemplateView> {
  return api.post<TemplateView>(templatePath(), body);
}

export function useCreateTemplate(options: { onSuccess?: (template: TemplateView) => void } = {}) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createTemplate,
    onSuccess: async (template) => {
      // Whoever could create it may manage it.
      queryClient.setQueryData<WithAbilities<TemplateView>>(templateKeys.detail(template.id), {
        data: template,
        abilities: { manage: true },
      });
      await queryClient.invalidateQueries({ queryKey: templateKeys.list() });
      options.onSuccess?.(template);
    },
  });
}
