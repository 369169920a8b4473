import type { DeletionRequestView } from '@driftmark/shared';
import { useMutation } from '@tanstack/react-query';
import { api } from '@/lib/api-client';

/** POST /api/me/deletion-request: e-mails the signed-in athlete a confirm link. */
export function requestDeletion(): Promise<DeletionRequestView> {
  return api.post<DeletionRequestView>('/api/me/deletion-request');
}

export function useRequestDeletion() {
  return useMutation({ mutationFn: requestDeletion });
}
