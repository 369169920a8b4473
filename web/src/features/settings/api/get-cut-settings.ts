import type { CutSettingsView } from '@driftmark/shared';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { api, type WithAbilities } from '@/lib/api-client';
import { cutSettingKeys } from './keys';

/** GET /api/team/cut-settings (staff): the acute-share threshold, its default, the 7 % line, sources. */
export function getCutSettings(signal?: AbortSignal): Promise<WithAbilities<CutSettingsView>> {
  return api.getWithAbilities<CutSettingsView>('/api/team/cut-settings', signal);
}

export function cutSettingsQueryOptions() {
  return queryOptions({
    queryKey: cutSettingKeys.threshold,
    queryFn: ({ signal }) => getCutSettings(signal),
  });
}

export function useCutSettings() {
  return useQuery(cutSettingsQueryOptions());
}
