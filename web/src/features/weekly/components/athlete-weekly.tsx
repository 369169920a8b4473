import type { WeightUnit } from '@driftmark/shared';
import { useState } from 'react';
import { Alert } from '@/components/ui/alert';
import { Badge } from '@/components/ui/badge';
import { Button } from '@/components/ui/button';
import { Card, CardHeader } from '@/components/ui/card';
import { Skeleton } from '@/components/ui/spinner';
import { formatInstant, viewerClock } from '@/lib/clock';
import { formatDate } from '@/lib/format';
import { useCurrentWeeklyCheckIn } from '../api/get-current-weekly-check-in';
import { WEEKLY_STATUS_LABELS, WEEKLY_STATUS_TONES } from '../utils/weekly';
import { WeeklyCheckInForm } from './weekly-check-in-form';
import { WeeklyFiguresList } from './weekly-figures';
import { WeeklyAnswers, WeeklyReply } from './weekly-reply';

/** The athlete's weekly check-in: the week's figures, the form while due, then the status and the reply. */
export function AthleteWeekly({
  athleteId,
  weightUnit,
  timeZone,
}: {
  athleteId: string;
  weightUnit: WeightUnit;
  timeZone: string;
}) {
  const current = useCurrentWeeklyCheckIn(athleteId);
  const [editing, setEditing] = useState(false);

  if (current.isPending) {
    return (
      <div aria-busy="true" aria-label="Loading the weekly check-in" className="space-y-4">
        <Skeleton className="h-48" />
        <Skeleton className="h-64" />
      </div>
    );
  }
  if (current.isError) {
    return (
      <Alert
        tone="error"
        title="The weekly check-in could not be loaded."
        action={
          <Button variant="secondary" onClick={() => void current.refetch()}>
            Try again
          </Button>
        }
      >
        {current.error.message}
      </Alert>
    );
  }

  const view = current.data.data;
  const canSubmit = current.data.abilities.submit !== false;
  const showForm = canSubmit && (view.status === 'due' || (view.status === 'submitted' && editing));

  return (
    <div className="space-y-4">
      <div className="flex flex-wrap items-center gap-2">
        <p className="text-sm text-ink-muted tabular-nums">Due {formatDate(view.dueDate)}</p>
        <Badge tone={WEEKLY_STATUS_TONES[view.status]}>{WEEKLY_STATUS_LABELS[view.status]}</Badge>
      </div>

      {view.status === 'submitted' || view.status === 'answered' ? (
        <Alert tone="success" title="Sent — your coach will reply here" live={false}>
          {view.submittedAt
            ? `Sent ${formatInstant(view.submittedAt, timeZone ? { whose: 'viewer', timeZone } : viewerClock())}.`
            : null}
        </Alert>
      ) : null}
      {view.reply ? <WeeklyReply reply={view.reply} timeZone={timeZone} /> : null}
      {view.status === 'not_due' ? (
        <Alert tone="info" title="Nothing is due yet" live={false}>
          {view.firstDueDate
            ? `Your first weekly check-in is due on ${formatDate(view.firstDueDate)}; it covers the week before it.`
            : 'Your first weekly check-in opens on your check-in day.'}
        </Alert>
      ) : null}
      {view.status === 'missed' ? (
        <Alert tone="caution" title="This check-in was missed">
          The next one opens on your check-in day.
        </Alert>
      ) : null}

      <Card aria-labelledby="weekly-figures-heading">
        <CardHeader id="weekly-figures-heading" title="Your week in figures" />
        <WeeklyFiguresList figures={view.figures} weightUnit={weightUnit} />
      </Card>

      {view.status === 'not_due' ? null : (
        <Card aria-labelledby="weekly-answers-heading">
          <CardHeader
            id="weekly-answers-heading"
            title={showForm ? 'Tell your coach about the week' : 'Your answers'}
            action={
              canSubmit && view.status === 'submitted' && !editing ? (
                <Button variant="secondary" size="sm" onClick={() => setEditing(true)}>
                  Change my answers
                </Button>
              ) : undefined
            }
          />
          {showForm ? (
            <WeeklyCheckInForm
              key={`${view.dueDate}-${view.submittedAt ?? ''}`}
              athleteId={athleteId}
              view={view}
              onSubmitted={() => setEditing(false)}
            />
          ) : (
            <WeeklyAnswers view={view} />
          )}
        </Card>
      )}
    </div>
  );
}
