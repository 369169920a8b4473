/**
 * A few marks on the demo athletes' charts, with replies and read state, so the review queue, the
 * athlete page and the athlete's trends have something to show. Every word is invented for the
 * demo. The dates come from each athlete's generated history (so a note about missed weigh-ins
 * sits on days that have none), counted back from the seed date in the athlete's own time zone;
 * the instants are on those days' local clocks, never after the seed's now.
 *
 * What the demo shows: Mateo has two marks from the head coach he has not read yet; Leilani
 * answered the coach about missed weigh-ins and the coach has not read it (the review queue lists
 * it); Hannah read the assistant's note on a shared athlete; Aroha and Kenji read theirs.
 */
import type { MarkMetric } from '@driftmark/shared';
import { In, type EntityManager } from 'typeorm';
import { Athlete } from '../entities/athlete.entity.js';
import { localInstant } from '../lib/local-time.js';
import { MarkRepository } from '../repositories/mark.repository.js';
import { addDays } from './calendar.js';
import type { DemoSituation } from './demo-team.js';
import type { AthleteHistory } from './history.js';
import type { DemoHistoryPlan } from './seed-history.js';
import type { DemoPlanIds } from './seed-plans.js';

/** A moment on the athlete's calendar: `t` days before the seed date, at a local clock time. */
interface Moment {
  t: number;
  time: string;
}

export interface DemoMark {
  athlete: DemoSituation;
  author: 'owner' | 'assistant';
  metric: MarkMetric;
  /** Days before the seed date of the first and last day (from ≥ to). */
  fromT: number;
  toT: number;
  note: string;
  at: Moment;
  reply?: { body: string; at: Moment };
  /** When the athlete read the thread; none: unread by them. */
  athleteReadAt?: Moment;
  /** When the author read the thread after the reply; none: the reply is unread by them. */
  authorReadAt?: Moment;
}

const WORDS = ['', 'One', 'Two', 'Three', 'Four', 'Five', 'Six', 'Seven'];

/**
 * The latest run of days without a weigh-in (at least `min` long) that ended at least two days
 * before the seed, as `t` of its first and last day; null when there is none.
 */
function latestMissedRun(history: AthleteHistory, min: number): { fromT: number; toT: number } | null {
  let best: { fromT: number; toT: number } | null = null;
  let runStart: number | null = null;
  for (const day of history.days) {
    if (!day.weighIn) {
      runStart ??= day.daysBeforeSeed;
      continue;
    }
    if (runStart !== null) {
      const toT = day.daysBeforeSeed + 1;
      if (runStart - toT + 1 >= min && toT >= 2) best = { fromT: runStart, toT };
      runStart = null;
    }
  }
  return best;
}

/** The latest morning (at least three days ago) whose weigh-in followed a high-carbohydrate day. */
function latestRefeedMorning(history: AthleteHistory): number | null {
  const days = history.days.filter(
    (d) => d.daysBeforeSeed >= 3 && d.weighIn?.tags.includes('high_carb_meal'),
  );
  return days.at(-1)?.daysBeforeSeed ?? null;
}

/** The demo marks, from the athletes' generated histories (pure: no clock, no database). */
export function planDemoMarks(plans: readonly DemoHistoryPlan[]): DemoMark[] {
  const history = (key: DemoSituation) => plans.find((p) => p.def.key === key)?.history;
  const marks: DemoMark[] = [
    {
      athlete: 'final_week',
      author: 'owner',
      metric: 'weight',
      fromT: 3,
      toT: 1,
      note:
        'Lower-carbohydrate days: the scale is down as expected, that is glycogen and the water it ' +
        'holds. It comes back as carbohydrates go up over the last three days. Nothing to change.',
      at: { t: 0, time: '07:30' },
    },
    {
      athlete: 'final_week',
      author: 'owner',
      metric: 'general',
      fromT: 2,
      toT: 2,
      note:
        'Thanks for telling me about the dizzy spell. Sit down for posing practice until ' +
        'carbohydrates are back up, and message me straight away if it happens again.',
      at: { t: 2, time: '15:10' },
      reply: { body: 'Will do. Felt steady again after lunch.', at: { t: 2, time: '18:45' } },
      authorReadAt: { t: 1, time: '08:05' },
    },
    {
      athlete: 'weigh_in',
      author: 'owner',
      metric: 'weight',
      fromT: 14,
      toT: 10,
      note: 'Weight moving as planned toward the class limit. Keep the food exactly the same this week.',
      at: { t: 9, time: '07:20' },
      athleteReadAt: { t: 9, time: '12:30' },
    },
    {
      athlete: 'regain',
      author: 'owner',
      metric: 'weight',
      fromT: 20,
      toT: 14,
      note:
        'First week after the show: most of this rise is glycogen and water coming back. Expected, ' +
        'and it slows from here.',
      at: { t: 13, time: '09:00' },
      reply: {
        body: 'Good to know, I was a bit worried. Feeling much better.',
        at: { t: 13, time: '21:15' },
      },
      athleteReadAt: { t: 13, time: '21:15' },
      authorReadAt: { t: 12, time: '08:40' },
    },
  ];

  const skipper = history('skips_check_ins');
  const run = skipper && (latestMissedRun(skipper, 3) ?? latestMissedRun(skipper, 2));
  if (run) {
    const count = run.fromT - run.toT + 1;
    marks.push({
      athlete: 'skips_check_ins',
      author: 'owner',
      metric: 'weight',
      ...run,
      note: `${WORDS[count] ?? count} missed weigh-ins in a row. Everything OK?`,
      at: { t: run.toT - 1, time: '08:30' },
      // Unread by the coach: the review queue lists it.
      reply: {
        body: 'All good! Away for work without my scale. Back on it now.',
        at: { t: run.toT - 1, time: '19:40' },
      },
    });
  }

  const diet = history('long_diet');
  const refeed = diet && latestRefeedMorning(diet);
  if (refeed != null) {
    marks.push({
      athlete: 'long_diet',
      author: 'assistant',
      metric: 'weight',
      fromT: refeed,
      toT: refeed,
      note:
        'Up this morning after yesterday’s refeed: water and glycogen, not fat. Expect it to settle ' +
        'within two or three days.',
      at: { t: refeed, time: '10:15' },
      athleteReadAt: { t: refeed, time: '13:05' },
    });
  }
  return marks;
}

/** Writes the demo marks inside the seed's transaction, through the repository the API uses. */
export async function writeDemoMarks(
  manager: EntityManager,
  plans: readonly DemoHistoryPlan[],
  ids: DemoPlanIds,
  now: Date,
): Promise<void> {
  const repo = new MarkRepository(manager);
  const athletes = await manager.find(Athlete, {
    where: { id: In([...ids.athleteIds.values()]) },
    select: { id: true, userId: true },
  });
  const userIds = new Map(athletes.map((a) => [a.id, a.userId]));
  for (const mark of planDemoMarks(plans)) {
    const plan = plans.find((p) => p.def.key === mark.athlete);
    const athleteId = ids.athleteIds.get(mark.athlete);
    const athleteUserId = athleteId && userIds.get(athleteId);
    if (!plan || !athleteId || !athleteUserId) throw new Error(`No athlete for ${mark.athlete}`);
    const { seedDate } = plan.history;
    const tz = plan.def.timeZone;
    const date = (t: number) => addDays(seedDate, -t);
    // Never after the seed's now ("this morning" may not have come yet where the athlete is).
    const at = (m: Moment) =>
      new Date(Math.min(localInstant(date(m.t), m.time, tz).getTime(), now.getTime() - 60_000));
    const authorId = mark.author === 'assistant' ? ids.assistantId : ids.ownerId;

    const created = await repo.create({
      athleteId,
      authorId,
      metric: mark.metric,
      fromDate: date(mark.fromT),
      toDate: date(mark.toT),
      note: mark.note,
      createdAt: at(mark.at),
    });
    // Writing marks the thread read for its writer, as the API does.
    await repo.upsertRead(created.id, authorId, at(mark.at));
    if (mark.reply) {
      await repo.addReply({
        markId: created.id,
        authorId: athleteUserId,
        body: mark.reply.body,
        createdAt: at(mark.reply.at),
      });
      await repo.upsertRead(created.id, athleteUserId, at(mark.reply.at));
    }
    if (mark.athleteReadAt) await repo.upsertRead(created.id, athleteUserId, at(mark.athleteReadAt));
    if (mark.authorReadAt) await repo.upsertRead(created.id, authorId, at(mark.authorReadAt));
  }
}
