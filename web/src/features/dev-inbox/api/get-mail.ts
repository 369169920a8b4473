import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import type { CapturedMailSummary } from './get-mail-list';
import { devMailKeys } from './keys';

export interface CapturedMail extends CapturedMailSummary {
  from: string;
  text: string;
  html: string | null;
}

/** GET /api/dev/mail/:id: one captured e-mail with its text. */
export function getMail(id: string, signal?: AbortSignal): Promise<CapturedMail> {
  return api.get<CapturedMail>(`/api/dev/mail/${encodeURIComponent(id)}`, signal);
}

export function mailQueryOptions(id: string) {
  return queryOptions({
    queryKey: devMailKeys.detail(id),
    queryFn: ({ signal }) => getMail(id, signal),
    // A captured message never changes.
    staleTime: Infinity,
  });
}

export function useMail(id: string | null) {
  return useQuery({ ...mailQueryOptions(id ?? ''), enabled: id !== null });
}
