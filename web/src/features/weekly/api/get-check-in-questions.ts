import type { CheckInQuestion } from '@driftmark/shared';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { api, type WithAbilities } from '@/lib/api-client';
import { checkInQuestionKeys } from './keys';

/** The list, whether the API wraps it (`{ questions }`) or not. */
export function readQuestions(data: unknown): CheckInQuestion[] {
  if (Array.isArray(data)) return data as CheckInQuestion[];
  if (data && typeof data === 'object' && Array.isArray((data as { questions?: unknown }).questions)) {
    return (data as { questions: CheckInQuestion[] }).questions;
  }
  return [];
}

/** GET /api/team/check-in-questions: the coach's questions every weekly check-in asks. */
export async function getCheckInQuestions(signal?: AbortSignal): Promise<WithAbilities<CheckInQuestion[]>> {
  const result = await api.getWithAbilities<unknown>('/api/team/check-in-questions', signal);
  return { data: readQuestions(result.data), abilities: result.abilities };
}

export function checkInQuestionsQueryOptions() {
  return queryOptions({
    queryKey: checkInQuestionKeys.all,
    queryFn: ({ signal }) => getCheckInQuestions(signal),
  });
}

export function useCheckInQuestions() {
  return useQuery(checkInQuestionsQueryOptions());
}
