import { useId } from 'react';
import { ButtonLink, buttonClasses } from '@/components/ui/button';
import { ChevronLeftIcon, ChevronRightIcon } from '@/components/ui/icons';
import { cn } from '@/lib/cn';
import { addDays, isIsoDate } from '../utils/dates';

interface DayNavProps {
  date: string;
  /** The athlete's today: nothing after it can be opened. */
  today: string;
  hrefFor: (date: string) => string;
  /** A date box to jump to any day (the coach's page). */
  onPick?: (date: string) => void;
  className?: string;
}

/** Previous day, a date box (when `onPick` is given), next day, and back to today. */
export function DayNav({ date, today, hrefFor, onPick, className }: DayNavProps) {
  const inputId = useId();
  const atToday = date >= today;
  return (
    <nav aria-label="Choose a day" className={cn('flex flex-wrap items-center gap-2', className)}>
      <ButtonLink
        to={hrefFor(addDays(date, -1))}
        variant="secondary"
        aria-label="Previous day"
        className="px-3"
        icon={<ChevronLeftIcon className="text-xl" />}
      />
      {onPick ? (
        <>
          <label htmlFor={inputId} className="sr-only">
            Day
          </label>
          <input
            id={inputId}
            type="date"
            value={date}
            max={today}
            onChange={(e) => {
              if (isIsoDate(e.target.value) && e.target.value <= today) onPick(e.target.value);
            }}
            className="min-h-touch rounded-md border border-line-strong bg-surface px-3 text-base text-ink tabular-nums"
          />
        </>
      ) : null}
      {atToday ? (
        <span
          aria-hidden="true"
          className={buttonClasses('secondary', 'md', 'pointer-events-none px-3 opacity-40')}
        >
          <ChevronRightIcon className="text-xl" />
        </span>
      ) : (
        <ButtonLink
          to={hrefFor(addDays(date, 1))}
          variant="secondary"
          aria-label="Next day"
          className="px-3"
          icon={<ChevronRightIcon className="text-xl" />}
        />
      )}
      {date !== today ? (
        <ButtonLink to={hrefFor(today)} variant="ghost">
          Today
        </ButtonLink>
      ) : null}
    </nav>
  );
}
