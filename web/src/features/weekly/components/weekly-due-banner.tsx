import { Link } from 'react-router';
import { ButtonLink } from '@/components/ui/button';
import { formatDate } from '@/lib/format';
import { useCurrentWeeklyCheckIn } from '../api/get-current-weekly-check-in';

/** On Today: the weekly check-in is due, answered, or a small link to it otherwise (nothing while loading). */
export function WeeklyDueBanner({ athleteId, href }: { athleteId: string; href: string }) {
  const current = useCurrentWeeklyCheckIn(athleteId);
  const view = current.data?.data;
  if (!view) return null;
  if (view.status === 'due') {
    return (
      <section
        aria-labelledby="weekly-due-heading"
        className="rounded-lg border border-caution bg-caution-soft p-4"
      >
        <h2 id="weekly-due-heading" className="font-semibold text-ink">
          Your weekly check-in is due
        </h2>
        <p className="mt-1 text-sm text-ink-muted">
          The week up to {formatDate(view.figures.weekEnd, 'short')}: a few questions from your coach.
        </p>
        <ButtonLink to={href} className="mt-3 w-full sm:w-auto">
          Open the weekly check-in
        </ButtonLink>
      </section>
    );
  }
  if (view.status === 'not_due') {
    // Nothing is due before joining: a quiet note of when the first one is.
    return view.firstDueDate ? (
      <p className="rounded-lg border border-line bg-surface px-4 py-2 text-sm text-ink-muted">
        Your first weekly check-in is due on {formatDate(view.firstDueDate)}.
      </p>
    ) : null;
  }
  if (view.status === 'answered') {
    return (
      <section
        aria-labelledby="weekly-reply-banner"
        className="rounded-lg border border-accent bg-accent-soft p-4"
      >
        <h2 id="weekly-reply-banner" className="font-semibold text-ink">
          Your coach replied to your weekly check-in
        </h2>
        <ButtonLink to={href} variant="secondary" className="mt-3 w-full sm:w-auto">
          Read the reply
        </ButtonLink>
      </section>
    );
  }
  return (
    <Link
      to={href}
      className="flex min-h-touch items-center justify-between gap-3 rounded-lg border border-line bg-surface px-4 py-2 text-sm no-underline"
    >
      <span className="font-semibold text-ink">Weekly check-in</span>
      <span className="text-ink-muted">
        {view.status === 'submitted' ? 'Sent, waiting for a reply' : 'Missed'}
      </span>
    </Link>
  );
}
