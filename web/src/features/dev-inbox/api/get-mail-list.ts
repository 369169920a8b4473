import { queryOptions, useQuery } from '@tanstack/react-query';
import { DEV_INBOX_POLL_MS } from '@/config/app';
import { api } from '@/lib/api-client';
import { devMailKeys } from './keys';

export interface CapturedMailSummary {
  id: string;
  receivedAt: string;
  to: string[];
  subject: string;
}

/** GET /api/dev/mail: captured e-mails, newest first (404 when the inbox is off, as in production). */
export function getMailList(signal?: AbortSignal): Promise<CapturedMailSummary[]> {
  return api.get<CapturedMailSummary[]>('/api/dev/mail', signal);
}

export function mailListQueryOptions() {
  return queryOptions({
    queryKey: devMailKeys.list(),
    queryFn: ({ signal }) => getMailList(signal),
    staleTime: 0,
  });
}

/** Polls while the inbox page is open, so a just-sent e-mail appears without reloading. */
export function useMailList() {
  return useQuery({ ...mailListQueryOptions(), refetchInterval: DEV_INBOX_POLL_MS });
}

/** Whether this server captures e-mail (demo and development). Asked once; a 404 means no. */
export function useDevInboxAvailable(): boolean {
  const query = useQuery({
    ...mailListQueryOptions(),
    staleTime: Infinity,
    retry: false,
    select: () => true,
  });
  return query.data === true;
}
