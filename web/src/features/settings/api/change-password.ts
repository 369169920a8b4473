import type { ChangePasswordRequest, Me } from '@driftmark/shared';
import { useMutation } from '@tanstack/react-query';
import { api } from '@/lib/api-client';

/** POST /api/auth/change-password: keeps this session, signs out every other one. */
export function changePassword(body: ChangePasswordRequest): Promise<Me> {
  return api.post<Me>('/api/auth/change-password', body);
}

export function useChangePassword(options: { onSuccess?: (me: Me) => void } = {}) {
  return useMutation({ mutationFn: changePassword, onSuccess: (me) => options.onSuccess?.(me) });
}
