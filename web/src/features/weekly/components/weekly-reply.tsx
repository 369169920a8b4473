import type { CheckInQuestion, WeeklyCheckInView } from '@driftmark/shared';
import { formatInstant, viewerClock } from '@/lib/clock';
import { answerText } from '../utils/weekly';

/** The coach's reply to a check-in, as the athlete and staff read it. */
export function WeeklyReply({
  reply,
  timeZone,
}: {
  reply: NonNullable<WeeklyCheckInView['reply']>;
  timeZone?: string;
}) {
  return (
    <section
      aria-labelledby="weekly-reply-heading"
      className="rounded-md border border-accent bg-accent-soft p-4"
    >
      <h3 id="weekly-reply-heading" className="text-sm font-semibold text-accent-strong">
        Reply from {reply.by.name}
      </h3>
      <p className="mt-0.5 text-xs text-ink-muted tabular-nums">
        {formatInstant(reply.at, timeZone ? { whose: 'viewer', timeZone } : viewerClock())}
      </p>
      <p className="mt-2 whitespace-pre-wrap text-ink">{reply.body}</p>
      {reply.planVersionId ? (
        <p className="mt-2 text-sm text-ink-muted">Your plan was changed with this reply.</p>
      ) : null}
    </section>
  );
}

/** The check-in's answers and the athlete's own questions, read-only. */
export function WeeklyAnswers({ view }: { view: WeeklyCheckInView }) {
  const byId = new Map(view.answers.map((a) => [a.questionId, a.value]));
  return (
    <div className="space-y-3">
      {view.questions.length > 0 ? (
        <dl className="space-y-3">
          {view.questions.map((q) => (
            <div key={q.id}>
              <dt className="text-sm text-ink-muted">{q.prompt}</dt>
              <dd className="whitespace-pre-wrap text-ink">
                <AnswerValue question={q} value={byId.get(q.id)} />
              </dd>
            </div>
          ))}
        </dl>
      ) : null}
      <div>
        <h3 className="text-sm text-ink-muted">Questions for the coach</h3>
        <p className="whitespace-pre-wrap text-ink">{view.questionsForCoach?.trim() || 'None'}</p>
      </div>
    </div>
  );
}

function AnswerValue({ question, value }: { question: CheckInQuestion; value: unknown }) {
  const text = answerText(question, value);
  if (value === null || value === undefined || value === '')
    return <span className="text-ink-faint">{text}</span>;
  return <span className={typeof value === 'number' ? 'tabular-nums' : undefined}>{text}</span>;
}
