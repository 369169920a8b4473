import { checkInQuestionsRequest, QUESTION_KINDS } from '@driftmark/shared';
import { describe, expect, it } from 'vitest';
import { answerProblems } from '../services/weekly-check-in.service.js';
import { DEMO_CHECK_IN_QUESTIONS, DEMO_WEEKLY } from './seed-weekly.js';

describe('demo weekly check-ins', () => {
  it('asks a valid list with four questions of each kind', () => {
    expect(checkInQuestionsRequest.safeParse({ questions: DEMO_CHECK_IN_QUESTIONS }).success).toBe(true);
    for (const kind of QUESTION_KINDS) {
      expect(DEMO_CHECK_IN_QUESTIONS.filter((q) => q.kind === kind)).toHaveLength(4);
    }
  });

  it('answers each question by its kind, with Mateo due on the seed date', () => {
    for (const def of DEMO_WEEKLY) {
      for (const s of def.stored) {
        const answers = DEMO_CHECK_IN_QUESTIONS.map((q, i) => ({
          questionId: q.id,
          value: s.answers[i] ?? null,
        }));
        expect(answerProblems(DEMO_CHECK_IN_QUESTIONS, answers), def.athlete).toEqual({});
      }
    }
    expect(DEMO_WEEKLY.find((d) => d.athlete === 'final_week')?.daysAgo).toBe(0);
  });
});
