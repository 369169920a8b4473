import type { ForgotPasswordRequest } from '@driftmark/shared';
import { useMutation } from '@tanstack/react-query';
import { api } from '@/lib/api-client';

/** POST /api/auth/forgot-password: always 202; a link is e-mailed only if the account exists. */
export function requestPasswordReset(body: ForgotPasswordRequest): Promise<{ ok: true }> {
  return api.post<{ ok: true }>('/api/auth/forgot-password', body);
}

export function useRequestPasswordReset() {
  return useMutation({ mutationFn: requestPasswordReset });
}
