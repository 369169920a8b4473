import {
  DRIFT_METRIC_LABELS,
  RATING_LABELS,
  WEEKDAYS,
  type CheckInQuestion,
  type RatingKey,
  type Weekday,
  type WeeklyCheckInView,
  type WeeklyStatus,
} from '@driftmark/shared';
import type { BadgeTone } from '@/components/ui/badge';

export const WEEKLY_STATUS_LABELS: Record<WeeklyStatus, string> = {
  due: 'Due',
  submitted: 'Waiting for a reply',
  answered: 'Answered',
  missed: 'Missed',
  not_due: 'Not due yet',
};

export const WEEKLY_STATUS_TONES: Record<WeeklyStatus, BadgeTone> = {
  due: 'caution',
  submitted: 'accent',
  answered: 'on-plan',
  missed: 'not-logged',
  not_due: 'not-logged',
};

export function metricLabel(metric: string): string {
  return (DRIFT_METRIC_LABELS as Record<string, string>)[metric] ?? metric;
}

export function ratingLabel(key: string): string {
  return (RATING_LABELS as Record<string, string>)[key as RatingKey] ?? key;
}

/** A share (0–1) as a whole percentage; null → null. */
export function percent(share: number | null): string | null {
  return share === null ? null : `${Math.round(share * 100)}\u00a0%`;
}

/** The weekday of a date (YYYY-MM-DD), as the contract names them (mon … sun). */
export function weekdayOf(isoDate: string): Weekday {
  const [y, m, d] = isoDate.split('-').map(Number);
  const day = new Date(Date.UTC(y ?? 1970, (m ?? 1) - 1, d ?? 1)).getUTCDay(); // 0 = Sunday
  return WEEKDAYS[(day + 6) % 7]!;
}

/** An answer in plain words, by the question's kind. */
export function answerText(question: CheckInQuestion | undefined, value: unknown): string {
  if (value === null || value === undefined || value === '') return 'No answer';
  if (typeof value === 'boolean') return value ? 'Yes' : 'No';
  if (typeof value === 'number') return question?.kind === 'scale' ? `${value} of 5` : String(value);
  return String(value);
}

/** Form values: every control speaks strings ("1"–"5", "yes"/"no", text). */
export interface WeeklyFormValues {
  dueDate: string;
  answers: Array<{ questionId: string; value: string }>;
  questionsForCoach: string;
}

export function toFormValues(view: WeeklyCheckInView): WeeklyFormValues {
  const byId = new Map(view.answers.map((a) => [a.questionId, a.value]));
  return {
    dueDate: view.dueDate,
    answers: view.questions.map((q) => {
      const v = byId.get(q.id);
      const value =
        v === null || v === undefined ? '' : typeof v === 'boolean' ? (v ? 'yes' : 'no') : String(v);
      return { questionId: q.id, value };
    }),
    questionsForCoach: view.questionsForCoach ?? '',
  };
}

/** Form strings → the request's typed answers (empty → null). */
export function toAnswerValue(
  kind: CheckInQuestion['kind'] | undefined,
  raw: string,
): string | number | boolean | null {
  const text = raw.trim();
  if (text === '') return null;
  if (kind === 'scale') return Number(text);
  if (kind === 'yes_no') return text === 'yes';
  return text;
}
