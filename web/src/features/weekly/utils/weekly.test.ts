import type { WeeklyCheckInView } from '@driftmark/shared';
import { describe, expect, it } from 'vitest';
import { answerText, percent, toAnswerValue, toFormValues, weekdayOf } from './weekly';

const q = (id: string, kind: 'text' | 'scale' | 'yes_no') => ({ id, kind, prompt: 'How was it?' });

describe('weekly helpers', () => {
  it('names the weekday of a date', () => {
    expect(weekdayOf('2026-12-07')).toBe('mon');
    expect(weekdayOf('2026-12-06')).toBe('sun');
  });

  it('reads answers in plain words', () => {
    expect(answerText(q('a', 'yes_no'), true)).toBe('Yes');
    expect(answerText(q('a', 'scale'), 4)).toBe('4 of 5');
    expect(answerText(q('a', 'text'), null)).toBe('No answer');
    expect(percent(0.857)).toBe('86\u00a0%');
    expect(percent(null)).toBeNull();
  });

  it('turns form strings into typed answers and back', () => {
    expect(toAnswerValue('scale', '3')).toBe(3);
    expect(toAnswerValue('yes_no', 'no')).toBe(false);
    expect(toAnswerValue('text', '  ')).toBeNull();
    const view = {
      dueDate: '2026-12-07',
      questions: [q('11111111-1111-4111-8111-111111111111', 'yes_no')],
      answers: [{ questionId: '11111111-1111-4111-8111-111111111111', value: true }],
      questionsForCoach: null,
    } as unknown as WeeklyCheckInView;
    expect(toFormValues(view)).toEqual({
      dueDate: '2026-12-07',
      answers: [{ questionId: '11111111-1111-4111-8111-111111111111', value: 'yes' }],
      questionsForCoach: '',
    });
  });
});
