import type { WeeklyCheckInView, WeightUnit } from '@driftmark/shared';
import type { QueryKey } from '@tanstack/react-query';
import { Link } from 'react-router';
import { Alert } from '@/components/ui/alert';
import { Badge } from '@/components/ui/badge';
import { Button, ButtonLink } from '@/components/ui/button';
import { Card, CardHeader } from '@/components/ui/card';
import { EmptyState } from '@/components/ui/empty-state';
import type { SelectOption } from '@/components/ui/select';
import { Skeleton } from '@/components/ui/spinner';
import { cn } from '@/lib/cn';
import { formatInstant, viewerClock } from '@/lib/clock';
import { formatDate } from '@/lib/format';
import { useCurrentWeeklyCheckIn } from '../api/get-current-weekly-check-in';
import { useWeeklyCheckIn } from '../api/get-weekly-check-in';
import { useWeeklyCheckIns } from '../api/list-weekly-check-ins';
import { weekdayOf, WEEKLY_STATUS_LABELS, WEEKLY_STATUS_TONES } from '../utils/weekly';
import { CheckInDayForm } from './check-in-day-form';
import { WeeklyFiguresList } from './weekly-figures';
import { WeeklyAnswers, WeeklyReply } from './weekly-reply';
import { WeeklyReplyForm } from './weekly-reply-form';

interface CoachWeeklyProps {
  athleteId: string;
  /** The check-in opened in the detail (from the URL). */
  checkInId?: string;
  weightUnit: WeightUnit;
  timeZone?: string;
  detailHref: (checkInId: string) => string;
  planHref: string;
  planVersions: readonly SelectOption[];
  /** Whether this user may change the check-in day and reply. */
  canManage: boolean;
  linkedKeys?: QueryKey[];
}

/** The coach's weekly check-ins of one athlete: the check-in day, the list, and one check-in in detail. */
export function CoachWeekly(props: CoachWeeklyProps) {
  const { athleteId, detailHref } = props;
  const list = useWeeklyCheckIns(athleteId);
  // Without a choice in the URL, the newest stored check-in opens.
  const checkInId = props.checkInId ?? list.data?.data.find((c) => c.id !== null)?.id ?? undefined;
  const current = useCurrentWeeklyCheckIn(athleteId);
  const due = current.data?.data;

  return (
    <div className="grid gap-5 lg:grid-cols-[minmax(0,20rem)_minmax(0,1fr)]">
      <div className="space-y-4">
        {due && (current.data?.abilities.setCheckInDay ?? props.canManage) ? (
          <Card padding="compact" aria-label="Check-in day">
            <CheckInDayForm
              key={due.dueDate}
              athleteId={athleteId}
              weekday={weekdayOf(due.dueDate)}
              linkedKeys={props.linkedKeys}
            />
          </Card>
        ) : null}
        <Card padding="compact" aria-labelledby="weekly-list-heading">
          <CardHeader id="weekly-list-heading" title="Weekly check-ins" level={2} />
          {list.isPending ? (
            <div aria-busy="true" aria-label="Loading the check-ins" className="space-y-2">
              <Skeleton className="h-12" />
              <Skeleton className="h-12" />
            </div>
          ) : list.isError ? (
            <Alert
              tone="error"
              title="The check-ins could not be loaded."
              action={
                <Button variant="secondary" onClick={() => void list.refetch()}>
                  Try again
                </Button>
              }
            >
              {list.error.message}
            </Alert>
          ) : (
            <ul className="divide-y divide-line" aria-label="Check-ins">
              {due && due.id === null ? (
                <li className="flex items-center justify-between gap-2 px-2 py-2">
                  <span className="text-sm text-ink tabular-nums">
                    Week to {formatDate(due.dueDate, 'short')}
                  </span>
                  <Badge tone={WEEKLY_STATUS_TONES[due.status]}>
                    {due.status === 'due' ? 'Not sent yet' : WEEKLY_STATUS_LABELS[due.status]}
                  </Badge>
                </li>
              ) : null}
              {list.data.data.map((c) =>
                c.id ? (
                  <li key={c.id}>
                    <Link
                      to={detailHref(c.id)}
                      aria-current={c.id === checkInId ? 'page' : undefined}
                      className={cn(
                        'flex min-h-touch items-center justify-between gap-2 rounded-md px-2 py-2 no-underline hover:bg-sunken',
                        c.id === checkInId && 'bg-accent-soft',
                      )}
                    >
                      <span className="text-sm font-semibold text-ink tabular-nums">
                        Week to {formatDate(c.dueDate, 'short')}
                      </span>
                      <Badge tone={WEEKLY_STATUS_TONES[c.status]}>{WEEKLY_STATUS_LABELS[c.status]}</Badge>
                    </Link>
                  </li>
                ) : null,
              )}
              {list.data.data.length === 0 && !(due && due.id === null) ? (
                <li>
                  <EmptyState title="No check-ins yet" level={3}>
                    The athlete&apos;s first weekly check-in arrives on their check-in day.
                  </EmptyState>
                </li>
              ) : null}
            </ul>
          )}
        </Card>
      </div>
      <div>
        {checkInId ? (
          <CoachWeeklyDetail {...props} checkInId={checkInId} />
        ) : (
          <EmptyState title="Choose a check-in" level={2}>
            Open a check-in to read the week, the answers and to reply.
          </EmptyState>
        )}
      </div>
    </div>
  );
}

function CoachWeeklyDetail({
  athleteId,
  checkInId,
  weightUnit,
  timeZone,
  planHref,
  planVersions,
  canManage,
  linkedKeys,
}: CoachWeeklyProps & { checkInId: string }) {
  const detail = useWeeklyCheckIn(checkInId);
  if (detail.isPending) {
    return (
      <div aria-busy="true" aria-label="Loading the check-in" className="space-y-4">
        <Skeleton className="h-48" />
        <Skeleton className="h-32" />
      </div>
    );
  }
  if (detail.isError) {
    return (
      <Alert
        tone="error"
        title={detail.error.status === 404 ? 'No such check-in.' : 'The check-in could not be loaded.'}
        action={
          detail.error.status === 404 ? undefined : (
            <Button variant="secondary" onClick={() => void detail.refetch()}>
              Try again
            </Button>
          )
        }
      >
        {detail.error.message}
      </Alert>
    );
  }
  const view: WeeklyCheckInView = detail.data.data;
  const mayReply = detail.data.abilities.reply ?? (canManage && view.status === 'submitted');
  return (
    <div className="space-y-4">
      <Card aria-labelledby="weekly-detail-heading">
        <CardHeader
          id="weekly-detail-heading"
          eyebrow={
            view.submittedAt
              ? `Sent ${formatInstant(view.submittedAt, timeZone ? { whose: 'viewer', timeZone } : viewerClock())}`
              : undefined
          }
          title={`Week to ${formatDate(view.dueDate)}`}
          action={<Badge tone={WEEKLY_STATUS_TONES[view.status]}>{WEEKLY_STATUS_LABELS[view.status]}</Badge>}
        />
        <WeeklyFiguresList figures={view.figures} weightUnit={weightUnit} />
      </Card>
      <Card aria-labelledby="weekly-detail-answers">
        <CardHeader id="weekly-detail-answers" title="Answers" />
        <WeeklyAnswers view={view} />
      </Card>
      <Card aria-labelledby="weekly-detail-reply">
        <CardHeader
          id="weekly-detail-reply"
          title="Reply"
          action={
            canManage ? (
              <ButtonLink to={planHref} variant="secondary" size="sm">
                Change the plan
              </ButtonLink>
            ) : undefined
          }
        />
        {view.reply ? <WeeklyReply reply={view.reply} timeZone={timeZone} /> : null}
        {mayReply ? (
          <WeeklyReplyForm
            key={checkInId}
            athleteId={athleteId}
            checkInId={checkInId}
            planVersions={planVersions}
            linkedKeys={linkedKeys}
          />
        ) : !view.reply ? (
          <p className="text-sm text-ink-muted">No reply yet.</p>
        ) : null}
      </Card>
    </div>
  );
}
