import type { CheckInQuestion, CheckInQuestionsRequest } from '@driftmark/shared';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { readQuestions } from './get-check-in-questions';
import { checkInQuestionKeys, weeklyKeys } from './keys';

/** PUT /api/team/check-in-questions (owner or coach): replaces the whole list, in order. */
export async function updateCheckInQuestions(body: CheckInQuestionsRequest): Promise<CheckInQuestion[]> {
  return readQuestions(await api.put<unknown>('/api/team/check-in-questions', body));
}

export function useUpdateCheckInQuestions(
  options: { onSuccess?: (questions: CheckInQuestion[]) => void } = {},
) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: updateCheckInQuestions,
    onSuccess: async (questions) => {
      await Promise.all([
        queryClient.invalidateQueries({ queryKey: checkInQuestionKeys.all }),
        // A check-in still due asks the current list.
        queryClient.invalidateQueries({ queryKey: weeklyKeys.all }),
      ]);
      options.onSuccess?.(questions);
    },
  });
}
