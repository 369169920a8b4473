import type { ResetPasswordRequest } from '@driftmark/shared';
import { useMutation } from '@tanstack/react-query';
import { api } from '@/lib/api-client';

/** POST /api/auth/reset-password: sets a new password and signs out every session of that user. */
export function resetPassword(body: ResetPasswordRequest): Promise<{ ok: true }> {
  return api.post<{ ok: true }>('/api/auth/reset-password', body);
}

export function useResetPassword() {
  return useMutation({ mutationFn: resetPassword });
}
