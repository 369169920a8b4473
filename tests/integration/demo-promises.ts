/**
 * The README's demo table as checks: what each demo athlete's situation promises the coach, read
 * from the same services the review queue and the roster answer with. Every check returns the
 * broken promises as sentences (empty when all hold), so a failing day says what went wrong.
 */
import type { RehearsalView, ReviewQueueItem, RosterRow } from '@driftmark/shared';
import { addDays, localDate } from '../../api/src/seed/calendar.js';
import { DEMO_ATHLETES, type DemoSituation } from '../../api/src/seed/demo-team.js';

export interface DemoView {
  now: Date;
  roster: readonly RosterRow[];
  queue: readonly ReviewQueueItem[];
  /** Aroha's latest practice run, as her cut view carries it. */
  rehearsal: RehearsalView | null;
}

function byKey(view: DemoView, key: DemoSituation) {
  const def = DEMO_ATHLETES.find((d) => d.key === key)!;
  const row = view.roster.find((r) => r.email === def.email);
  const item = view.queue.find((q) => q.name === def.name);
  const today = localDate(view.now, def.timeZone);
  return { def, row, item, today };
}

/** The server's one rule for "has a safety flag" (the roster's count and the queue's safety items). */
const hasSafety = (row: RosterRow) => row.figures.safetyFlag;

/** Every promise of the README's demo table that does not hold in `view`. */
export function brokenDemoPromises(view: DemoView): string[] {
  const broken: string[] = [];
  const expect = (ok: boolean, what: string) => {
    if (!ok) broken.push(what);
  };

  // Mateo: E-4 of a show countdown, an urgent dizziness report in the last days.
  {
    const { row, item, today } = byKey(view, 'final_week');
    expect(
      row?.eventType === 'show' && row.eventDate === addDays(today, 4),
      `Mateo's show is not in 4 days (${row?.eventDate}, today ${today})`,
    );
    expect(row?.figures.countdownLabel === 'E-4', `Mateo is not on E-4 (${row?.figures.countdownLabel})`);
    expect(
      row?.figures.flags.includes('symptom') ?? false,
      `Mateo has no symptom flag (${row?.figures.flags})`,
    );
    expect(
      item?.priority === 1 && item.reasons.some((r) => r.kind === 'safety' && /dizz/i.test(r.text)),
      `Mateo is not in the queue with the dizziness as a safety reason (${JSON.stringify(item?.reasons)})`,
    );
    expect(
      item?.reasons.some((r) => r.kind === 'countdown') ?? false,
      'Mateo has no countdown reason in the queue',
    );
  }
  // Aroha: 10 days from a weigh-in, a drop of ≥ 2 % of body mass within 48 h in the last few days.
  {
    const { row, item, today } = byKey(view, 'weigh_in');
    expect(
      row?.eventType === 'weigh_in' && row.eventDate === addDays(today, 10),
      `Aroha's weigh-in is not in 10 days (${row?.eventDate}, today ${today})`,
    );
    expect(
      row?.figures.flags.includes('acute_drop') ?? false,
      `Aroha has no acute-drop flag (${row?.figures.flags})`,
    );
    expect(
      item?.priority === 1 && item.reasons.some((r) => r.kind === 'safety' && /down/i.test(r.text)),
      `Aroha is not in the queue with the drop as a safety reason (${JSON.stringify(item?.reasons)})`,
    );
    // Making weight: the projection at the weigh-in is over her 63.0 kg limit, with the gap and days.
    const gap = row?.figures.weighInGap ?? null;
    expect(
      gap !== null && gap.over && gap.overKg > 0 && gap.daysLeft === 10,
      `Aroha is not projected over her limit with 10 days left (${JSON.stringify(gap)})`,
    );
    expect(
      item?.reasons.some((r) => r.kind === 'over_limit' && /over the weigh-in limit/.test(r.text)) ?? false,
      `Aroha is not in the queue as over the limit (${JSON.stringify(item?.reasons)})`,
    );
    // A practice run a month ago: about 2 kg (2–4 %) down over two days, most of it back the next
    // morning, a symptom report on the practice weigh-in day, notes by her and her coach.
    const r = view.rehearsal;
    expect(
      r?.weighInDate === addDays(today, -31),
      `Aroha's practice weigh-in is not 31 days ago (${r?.weighInDate}, today ${today})`,
    );
    expect(
      r?.achieved != null && r.achieved.pct > 2 && r.achieved.pct < 4,
      `Aroha's practice run did not take off 2–4 % (${JSON.stringify(r?.achieved)})`,
    );
    expect(
      (r?.regained[0]?.shareOfLossPct ?? 0) > 50,
      `Aroha's practice run has no regain by the next morning (${JSON.stringify(r?.regained)})`,
    );
    expect(
      r?.days.some((d) => d.stage === 'weigh_in' && d.symptoms.length > 0) ?? false,
      'Aroha has no symptom report on her practice weigh-in day',
    );
    expect(
      (r?.days.filter((d) => d.note !== null).length ?? 0) >= 4,
      `Aroha's practice run lacks its day notes (${r?.days.filter((d) => d.note).length})`,
    );
  }
  // Priya: 5 weeks from a shoot, losing faster than 1.4 %/week over the last 14 days.
  {
    const { row, item, today } = byKey(view, 'photo_shoot');
    expect(
      row?.eventType === 'shoot' && row.eventDate === addDays(today, 35),
      `Priya's shoot is not in 5 weeks (${row?.eventDate}, today ${today})`,
    );
    const rate = row?.figures.ratePercentPerWeek ?? null;
    expect(rate !== null && rate < -1.4, `Priya's 14-day rate is not beyond −1.4 %/week (${rate})`);
    expect(
      row?.figures.flags.includes('rate_far_beyond') ?? false,
      `Priya has no rate flag (${row?.figures.flags})`,
    );
    expect(
      item?.priority === 1 && item.reasons.some((r) => r.kind === 'safety' && /1\.4/.test(r.text)),
      `Priya is not in the queue with the rate as a safety reason (${JSON.stringify(item?.reasons)})`,
    );
  }
  // Hannah: 16 weeks from a show, steady: losing within the guidance band, no safety flag.
  {
    const { row, today } = byKey(view, 'long_diet');
    expect(
      row?.eventType === 'show' && row.eventDate === addDays(today, 112),
      `Hannah's show is not 16 weeks out (${row?.eventDate}, today ${today})`,
    );
    const rate = row?.figures.ratePercentPerWeek ?? null;
    expect(
      rate !== null && rate < 0 && rate >= -1,
      `Hannah is not losing steadily within 1 %/week (${rate})`,
    );
    expect(row !== undefined && !hasSafety(row), `Hannah has a safety flag (${row?.figures.flags})`);
    expect(row?.figures.phase === 'dieting', `Hannah's phase is ${row?.figures.phase}`);
  }
  // Kenji: regaining three weeks after a show, no event planned.
  {
    const { row } = byKey(view, 'regain');
    expect(row?.eventType === 'none' || row?.eventType === null, `Kenji has an event (${row?.eventType})`);
    expect(row?.figures.phase === 'regaining', `Kenji's phase is ${row?.figures.phase}`);
    const rate = row?.figures.ratePercentPerWeek ?? null;
    expect(rate !== null && rate > 0, `Kenji is not regaining (${rate})`);
    expect(row !== undefined && !hasSafety(row), `Kenji has a safety flag (${row?.figures.flags})`);
  }
  // Leilani: misses days, yesterday among them; the queue says so.
  {
    const { row, item, today } = byKey(view, 'skips_check_ins');
    const yesterday = addDays(today, -1);
    const last = row?.figures.lastCheckInDate ?? null;
    expect(last !== null && last < yesterday, `Leilani logged yesterday or never (${last}, today ${today})`);
    expect(
      item?.reasons.some((r) => r.kind === 'missed') ?? false,
      `Leilani is not in the queue for missed check-ins (${JSON.stringify(item?.reasons)})`,
    );
    expect(row !== undefined && !hasSafety(row), `Leilani has a safety flag (${row?.figures.flags})`);
  }
  return broken;
}
