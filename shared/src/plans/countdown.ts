import type {
  CountdownPreviewDay,
  DateOverride,
  PlanBaseline,
  PlanContent,
  TemplateDay,
  TemplateView,
} from '../schemas/plans.js';
import type { CountdownMismatch } from '../schemas/athletes.js';
import type { EVENT_TYPES } from '../vocabulary.js';
import { addDays, cloneJson } from './format.js';
import { countdownDayLabel, resolveTargets, starterPlanContent } from './resolve.js';

export interface AppliedCountdown {
  content: PlanContent;
  effectiveFrom: string;
  days: CountdownPreviewDay[];
}

/**
 * A template applied to an athlete: the base content (the version in force, or a starter) with its
 * earlier countdown days removed and one dated day per template day (eventDate + offset) carrying the
 * template's targets and `countdownOffset`; days before `today` are listed as past and not added.
 * effectiveFrom = max(first countdown date, today) — or earlier, down to today, when the base had
 * countdown days still to come that the new version drops (they must stop applying at once).
 * The targets stay expressions (relative to the baseline); the version's baseline snapshot resolves them.
 */
export function applyTemplate(input: {
  base: PlanContent | null;
  template: Pick<TemplateView, 'id' | 'name' | 'days'>;
  eventDate: string;
  eventType: (typeof EVENT_TYPES)[number];
  today: string;
  baseline: PlanBaseline;
}): AppliedCountdown {
  const base = cloneJson(input.base ?? starterPlanContent());
  return place({
    base,
    days: input.template.days,
    eventDate: input.eventDate,
    today: input.today,
    baseline: input.baseline,
    countdown: {
      templateId: input.template.id,
      templateName: input.template.name,
      eventDate: input.eventDate,
      eventType: input.eventType,
    },
  });
}

/** The same countdown moved to a new event date (each countdown day keeps its offset). */
export function moveCountdown(input: {
  content: PlanContent;
  eventDate: string;
  today: string;
  baseline: PlanBaseline;
  /**
   * Earlier versions of the plan, newest first: countdown days of the same countdown that the
   * latest version no longer carries (they had passed when it was saved) come back from there, so
   * a countdown moved later covers today again instead of leaving a gap.
   */
  earlier?: readonly PlanContent[];
}): AppliedCountdown {
  const base = cloneJson(input.content);
  if (!base.countdown) throw new Error('This plan has no countdown to move');
  const days: TemplateDay[] = base.dates.flatMap((d) =>
    d.countdownOffset == null ? [] : [{ offset: d.countdownOffset, label: d.label, targets: d.targets }],
  );
  const same = (c: PlanContent['countdown']) =>
    c !== null &&
    c.templateName === base.countdown!.templateName &&
    c.templateId === base.countdown!.templateId &&
    c.eventType === base.countdown!.eventType;
  for (const content of input.earlier ?? []) {
    if (!same(content.countdown)) continue;
    for (const d of content.dates) {
      if (d.countdownOffset == null || days.some((x) => x.offset === d.countdownOffset)) continue;
      days.push({ offset: d.countdownOffset, label: d.label, targets: cloneJson(d.targets) });
    }
  }
  return place({
    base,
    days,
    eventDate: input.eventDate,
    today: input.today,
    baseline: input.baseline,
    countdown: { ...base.countdown, eventDate: input.eventDate },
  });
}

function place(input: {
  base: PlanContent;
  days: readonly TemplateDay[];
  eventDate: string;
  today: string;
  baseline: PlanBaseline;
  countdown: NonNullable<PlanContent['countdown']>;
}): AppliedCountdown {
  const { base, eventDate, today } = input;
  const days = [...input.days].sort((a, b) => a.offset - b.offset);
  const preview: CountdownPreviewDay[] = days.map((d) => {
    const date = addDays(eventDate, d.offset);
    return {
      date,
      offset: d.offset,
      dayLabel: countdownDayLabel(d.offset),
      label: d.label,
      targets: resolveTargets(d.targets, input.baseline),
      past: date < today,
    };
  });

  const newDates = new Set(preview.map((d) => d.date));
  const firstDate = preview[0]?.date ?? today;
  // Countdown days of the base still ahead would otherwise keep applying until the new version starts.
  const droppedAhead = base.dates
    .filter((d) => d.countdownOffset != null && d.date >= today)
    .map((d) => d.date)
    .sort();
  const start = droppedAhead[0] !== undefined && droppedAhead[0] < firstDate ? droppedAhead[0] : firstDate;
  const effectiveFrom = start > today ? start : today;

  const kept = base.dates.filter(
    // Earlier countdown days go; a plain dated day on a countdown date gives way; days before the
    // version starts are never read under it.
    (d) => d.countdownOffset == null && !newDates.has(d.date) && d.date >= effectiveFrom,
  );
  const added: DateOverride[] = preview.flatMap((d, i) =>
    d.past
      ? []
      : [
          {
            date: d.date,
            label: d.label,
            countdownOffset: d.offset,
            targets: cloneJson(days[i]!.targets),
          },
        ],
  );

  return {
    content: {
      ...base,
      dates: [...kept, ...added].sort((a, b) => (a.date < b.date ? -1 : a.date > b.date ? 1 : 0)),
      countdown: input.countdown,
    },
    effectiveFrom,
    days: preview,
  };
}

/**
 * When the plan's countdown counts back from another day than the athlete's event: the countdown
 * of `content` (the athlete's latest version, the one in force from its start on) against
 * `eventDate`. Null when they agree, without a countdown or an event date, or once the countdown's
 * last day is before `today` (an old countdown no longer aims at anything).
 */
export function countdownMismatch(
  content: PlanContent | null,
  eventDate: string | null,
  today: string,
): CountdownMismatch | null {
  const countdown = content?.countdown;
  if (!content || !countdown || eventDate === null || countdown.eventDate === eventDate) return null;
  const offsets = content.dates.flatMap((d) => (d.countdownOffset == null ? [] : [d.countdownOffset]));
  const lastDay =
    offsets.length > 0 ? addDays(countdown.eventDate, Math.max(...offsets)) : countdown.eventDate;
  if (lastDay < today) return null;
  return { countdownEventDate: countdown.eventDate, eventDate };
}
