import type { TemplateView } from '@driftmark/shared';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { api, type WithAbilities } from '@/lib/api-client';
import { templateKeys } from './keys';
import { templatePath } from './template-path';

/** GET /api/countdown-templates/:templateId (staff of the template's team; others get 404). */
export function getTemplate(templateId: string, signal?: AbortSignal): Promise<WithAbilities<TemplateView>> {
  return api.getWithAbilities<TemplateView>(templatePath(templateId), signal);
}

export function templateQueryOptions(templateId: string) {
  return queryOptions({
    queryKey: templateKeys.detail(templateId),
    queryFn: ({ signal }) => getTemplate(templateId, signal),
  });
}

export function useTemplate(templateId: string) {
  return useQuery({ ...templateQueryOptions(templateId), enabled: templateId !== '' });
}
