import {
  NOT_MEDICAL_ADVICE_TEXT,
  STOP_SIGNS_TEXT,
  type CountdownDay,
  type DayCaution,
  type DayView,
} from '@driftmark/shared';
import { Badge } from '@/components/ui/badge';
import { CautionIcon } from '@/components/ui/icons';
import { formatDate, formatNumber } from '@/lib/format';

const EVENT_NOUN: Record<CountdownDay['eventType'], string> = {
  show: 'show',
  shoot: 'shoot',
  weigh_in: 'weigh-in',
  none: 'event',
};

/** "3 days to the show", "Weigh-in day", "1 day after the shoot". */
export function daysToEventText(countdown: Pick<CountdownDay, 'offset' | 'eventType'>): string {
  const noun = EVENT_NOUN[countdown.eventType];
  const n = Math.abs(countdown.offset);
  if (countdown.offset === 0) return `${noun.charAt(0).toUpperCase()}${noun.slice(1)} day`;
  const days = `${formatNumber(n)} ${n === 1 ? 'day' : 'days'}`;
  return countdown.offset < 0 ? `${days} to the ${noun}` : `${days} after the ${noun}`;
}

/**
 * On a countdown day: the day label ("E-3 · Water load") with the days to the event, then the
 * cautions; on any other day with acknowledged guardrail warnings, the cautions alone. Each
 * caution's message, then what to do on warning signs and that the plan is not medical advice.
 */
export function DayCautionCard({ day }: { day: Pick<DayView, 'countdown' | 'cautions'> }) {
  const { countdown, cautions } = day;
  if (!countdown && cautions.length === 0) return null;
  return (
    <section
      aria-labelledby="day-caution-heading"
      className="overflow-hidden rounded-lg border-2 border-caution/60 bg-surface shadow-card"
    >
      {countdown ? <CountdownLabel countdown={countdown} /> : null}
      <div className="px-4 py-4 sm:px-5">
        <h2 id="day-caution-heading" className="flex items-center gap-2 text-lg font-semibold text-caution">
          <CautionIcon className="shrink-0 text-xl" />
          {countdown ? 'Caution on countdown days' : 'Caution today'}
        </h2>
        {cautions.length > 0 ? <CautionList cautions={cautions} /> : null}
        <p className="mt-3 rounded-md border border-off-plan/50 bg-off-plan-soft px-3 py-2.5 text-sm font-semibold text-ink">
          {STOP_SIGNS_TEXT}
        </p>
        <p className="mt-3 text-sm text-ink-muted">{NOT_MEDICAL_ADVICE_TEXT}</p>
      </div>
    </section>
  );
}

function CountdownLabel({ countdown }: { countdown: CountdownDay }) {
  return (
    <div className="flex items-center gap-4 bg-caution-soft px-4 py-3 sm:px-5">
      <p
        className="shrink-0 text-3xl font-bold tracking-tight whitespace-nowrap text-caution tabular-nums"
        aria-hidden="true"
      >
        {countdown.dayLabel}
      </p>
      <div className="min-w-0">
        <p className="text-lg leading-tight font-bold text-ink">
          <span className="sr-only">{countdown.dayLabel} · </span>
          {countdown.label ?? 'Countdown day'}
        </p>
        <p className="text-sm text-ink-muted tabular-nums">
          {daysToEventText(countdown)} · {formatDate(countdown.eventDate)}
        </p>
      </div>
    </div>
  );
}

function CautionList({ cautions }: { cautions: DayCaution[] }) {
  return (
    <ul className="mt-2 space-y-2.5">
      {cautions.map((c, i) => (
        <li key={`${c.code}:${i}`} className="text-sm text-ink">
          {c.severity === 'strong' ? (
            <Badge tone="caution" className="mr-1.5 align-[0.1em]">
              Strong warning
            </Badge>
          ) : null}
          {c.message}
          {c.source ? <span className="mt-0.5 block text-xs text-ink-faint">Source: {c.source}</span> : null}
        </li>
      ))}
    </ul>
  );
}
