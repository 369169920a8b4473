import type { TemplateView } from '@driftmark/shared';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { api, type WithAbilities } from '@/lib/api-client';
import { templateKeys } from './keys';
import { templatePath } from './template-path';

/** GET /api/countdown-templates (staff): the team's library; abilities.manage for owner and coaches. */
export function getTemplates(signal?: AbortSignal): Promise<WithAbilities<TemplateView[]>> {
  return api.getWithAbilities<TemplateView[]>(templatePath(), signal);
}

export function templatesQueryOptions() {
  return queryOptions({
    queryKey: templateKeys.list(),
    queryFn: ({ signal }) => getTemplates(signal),
  });
}

export function useTemplates(options: { enabled?: boolean } = {}) {
  return useQuery({ ...templatesQueryOptions(), enabled: options.enabled ?? true });
}
