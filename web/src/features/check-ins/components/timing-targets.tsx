import { minutesBeforeLabel, type DayView, type VolumeUnit } from '@driftmark/shared';
import { formatClock, type Clock } from '@/lib/clock';
import { formatDate, formatEnergy, formatNumber, formatVolume } from '@/lib/format';

type Breach = DayView['timingBreaches'][number];

/**
 * The day's timing targets beyond the fluid cut-off: "all food before 13:00" with its allowance,
 * "only sips" (a fluid cap), and items timed before the event, each time on the athlete's clock
 * with its place. Breaches are the server's (`timingBreaches`); nothing is judged here.
 */
export function TimingTargets({ day, volumeUnit }: { day: DayView; volumeUnit: VolumeUnit }) {
  const t = day.targets?.targets;
  if (!t) return null;
  const clock: Clock = { whose: 'athlete', timeZone: day.timeZone };
  const breach = (kind: Breach['kind']) => day.timingBreaches.find((b) => b.kind === kind);
  const food = breach('food_cutoff');
  const cap = breach('fluid_cap');
  if (!t.foodCutoff && !t.fluidCap && t.eventTimed.length === 0) return null;

  return (
    <div className="mt-4 space-y-3" aria-label="Timing">
      {t.foodCutoff ? (
        <TimingLine
          title={`All food before ${formatClock(t.foodCutoff.time, clock)}`}
          detail={
            t.foodCutoff.allowanceKcal > 0
              ? `After it at most ${formatEnergy(t.foodCutoff.allowanceKcal)}.`
              : 'Nothing after it.'
          }
          breach={
            food
              ? `Logged after ${food.after}: ${formatEnergy(food.logged)}, ${formatNumber(food.excess)} kcal beyond the allowance.`
              : null
          }
        />
      ) : null}
      {t.fluidCap ? (
        <TimingLine
          title={`Only sips: at most ${formatVolume(t.fluidCap.maxMl, volumeUnit)} ${
            t.fluidCap.after ? `after ${formatClock(t.fluidCap.after, clock)}` : 'all day'
          }`}
          detail={null}
          breach={
            cap
              ? `Logged ${cap.after ? `after ${cap.after}` : 'today'}: ${formatVolume(cap.logged, volumeUnit)}, ${formatVolume(cap.excess, volumeUnit)} beyond the cap.`
              : null
          }
        />
      ) : null}
      {t.eventTimed.length > 0 ? (
        <div>
          <p className="text-sm font-semibold text-ink">Timed to the event</p>
          <ul className="mt-1 space-y-1 text-sm text-ink">
            {t.eventTimed.map((e) => (
              <li key={`${e.itemId}@${e.minutesBefore}`} className="flex flex-wrap gap-x-2">
                <span className="font-medium">
                  {e.item}
                  {e.dose != null ? ` ${formatNumber(e.dose, 2)}${e.unit ? ` ${e.unit}` : ''}` : ''}
                </span>
                <span className="text-ink-muted">· {minutesBeforeLabel(e.minutesBefore)} the event</span>
                <span className="tabular-nums">
                  {e.at
                    ? `· ${formatClock(e.at.time, clock)}${e.at.date !== day.date ? ` on ${formatDate(e.at.date)}` : ''}`
                    : '· the event has no clock time yet'}
                </span>
              </li>
            ))}
          </ul>
        </div>
      ) : null}
    </div>
  );
}

function TimingLine({
  title,
  detail,
  breach,
}: {
  title: string;
  detail: string | null;
  breach: string | null;
}) {
  return (
    <div>
      <p className="text-sm font-semibold text-ink tabular-nums">{title}</p>
      {detail ? <p className="text-sm text-ink-muted">{detail}</p> : null}
      {breach ? <p className="text-sm font-medium text-off-plan tabular-nums">{breach}</p> : null}
    </div>
  );
}
