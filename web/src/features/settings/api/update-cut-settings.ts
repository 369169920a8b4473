import type { CutSettingsRequest, CutSettingsView } from '@driftmark/shared';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api, type WithAbilities } from '@/lib/api-client';
import { cutSettingKeys } from './keys';

/** PUT /api/team/cut-settings (owner): sets the threshold; answers as GET does. */
export function updateCutSettings(body: CutSettingsRequest): Promise<CutSettingsView> {
  return api.put<CutSettingsView>('/api/team/cut-settings', body);
}

export function useUpdateCutSettings(options: { onSuccess?: (view: CutSettingsView) => void } = {}) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: updateCutSettings,
    onSuccess: (view) => {
      queryClient.setQueryData<WithAbilities<CutSettingsView>>(cutSettingKeys.threshold, (prev) => ({
        data: view,
        abilities: prev?.abilities ?? {},
      }));
      options.onSuccess?.(view);
    },
  });
}
