/**
 * The demo team's weekly check-ins: the coach's question list (four of each kind, invented for the
 * demo), a check-in weekday per athlete and a few stored check-ins, all relative to the seed date
 * in each athlete's own time zone. What the demo shows:
 * - Mateo's check-in is due today (his weekday is the seed date's), with last week's answered;
 * - Kenji sent his yesterday evening and nobody has answered it yet (review queue);
 * - Leilani, who skips check-ins, has one two days overdue (review queue: missed);
 * - two more athletes have last week's check-in answered by the head coach.
 */
import { weekdayOf, type CheckInQuestion, type Weekday } from '@driftmark/shared';
import type { DataSource } from 'typeorm';
import { Athlete } from '../entities/athlete.entity.js';
import type { WeeklyAnswer, WeeklyCheckIn } from '../entities/weekly-check-in.entity.js';
import { localInstant } from '../lib/local-time.js';
import { AthleteRepository } from '../repositories/athlete.repository.js';
import { WeeklyCheckInRepository } from '../repositories/weekly-check-in.repository.js';
import { WeeklyCheckInService } from '../services/weekly-check-in.service.js';
import { addDays, localDate } from './calendar.js';
import type { DemoSituation } from './demo-team.js';
import type { DemoPlanIds } from './seed-plans.js';

const q = (n: number, kind: CheckInQuestion['kind'], prompt: string): CheckInQuestion => ({
  id: `5e1c0a7e-4d2b-4f6a-9c3e-${n.toString(16).padStart(12, '0')}`,
  kind,
  prompt,
});

/** The head coach's questions, in the order the form asks them. */
export const DEMO_CHECK_IN_QUESTIONS: readonly CheckInQuestion[] = [
  q(1, 'scale', 'How hard did this week’s training feel?'),
  q(2, 'scale', 'How well did you recover between sessions?'),
  q(3, 'scale', 'How easy was it to stay on the meal plan?'),
  q(4, 'scale', 'How settled did your stomach feel?'),
  q(5, 'yes_no', 'Did you hit every planned session?'),
  q(6, 'yes_no', 'Did you eat anything off plan?'),
  q(7, 'yes_no', 'Did travel or work throw the week off?'),
  q(8, 'yes_no', 'Are you happy to keep the plan as it is?'),
  q(9, 'text', 'What went best this week?'),
  q(10, 'text', 'What got in the way?'),
  q(11, 'text', 'Any aches, niggles or injuries?'),
  q(12, 'text', 'What would you like to change next week?'),
];

/** One athlete's week: their weekday (days before the seed date it fell on) and what is stored. */
interface DemoWeekly {
  athlete: DemoSituation;
  /** The check-in weekday is the weekday `daysAgo` days before the seed date (0: due today). */
  daysAgo: number;
  /** Stored check-ins: `weeksBack` 0 is the current due date, 1 the one before. */
  stored: {
    weeksBack: number;
    answers: readonly WeeklyAnswer['value'][];
    questionsForCoach: string | null;
    submittedAt: string;
    reply?: { body: string; daysAfter: number; time: string };
  }[];
}

const answersOf = (values: readonly WeeklyAnswer['value'][]): WeeklyAnswer[] =>
  DEMO_CHECK_IN_QUESTIONS.map((question, i) => ({ questionId: question.id, value: values[i] ?? null }));

export const DEMO_WEEKLY: readonly DemoWeekly[] = [
  {
    athlete: 'final_week',
    daysAgo: 0,
    stored: [
      {
        weeksBack: 1,
        answers: [
          4,
          3,
          4,
          4,
          true,
          false,
          false,
          true,
          'Posing practice every day',
          'Evening hunger',
          null,
          'Nothing, stay the course',
        ],
        questionsForCoach: 'Should I keep posing practice going on the carbohydrate days?',
        submittedAt: '19:10',
        reply: {
          body:
            'Yes, keep it short: ten minutes after the first meal. Weight is where we want it for ' +
            'show week; the plan for the last days is already in.',
          daysAfter: 1,
          time: '08:20',
        },
      },
    ],
  },
  {
    athlete: 'regain',
    daysAgo: 1,
    stored: [
      {
        weeksBack: 0,
        answers: [
          3,
          3,
          2,
          3,
          false,
          true,
          true,
          false,
          'Sleep was better',
          'Two late work dinners',
          'Tight lower back',
          'Fewer late meals',
        ],
        questionsForCoach: 'Can we move the rest day to Wednesday? Work is heavy mid-week.',
        submittedAt: '18:40',
      },
    ],
  },
  { athlete: 'skips_check_ins', daysAgo: 2, stored: [] },
  {
    athlete: 'long_diet',
    daysAgo: 3,
    stored: [
      {
        weeksBack: 1,
        answers: [
          4,
          2,
          3,
          4,
          true,
          false,
          false,
          true,
          'Steps every day',
          'Tired in the afternoons',
          null,
          null,
        ],
        questionsForCoach: null,
        submittedAt: '20:05',
        reply: {
          body: 'Good week. The afternoons should ease once the refeed day comes back next week.',
          daysAfter: 1,
          time: '09:00',
        },
      },
    ],
  },
  {
    athlete: 'photo_shoot',
    daysAgo: 4,
    stored: [
      {
        weeksBack: 1,
        answers: [3, 4, 4, 5, true, false, false, true, 'Meal prep on Sunday', null, null, 'More cardio?'],
        questionsForCoach: 'Is it time to add the extra cardio session?',
        submittedAt: '17:30',
        reply: {
          body: 'Not yet: the rate is right. We look at it again next week with the new photos.',
          daysAfter: 1,
          time: '07:45',
        },
      },
    ],
  },
  { athlete: 'weigh_in', daysAgo: 5, stored: [] },
];

/**
 * Writes the question list, each athlete's weekday and the stored check-ins, once the rest of the
 * demo team is committed: figures are read through the pool, the rows written in one transaction.
 */
export async function writeDemoWeekly(dataSource: DataSource, ids: DemoPlanIds, now: Date): Promise<void> {
  const service = new WeeklyCheckInService({ dataSource, clock: () => now });
  const athletes = new AthleteRepository(dataSource.manager);
  const rows: Partial<WeeklyCheckIn>[] = [];
  const weekdays = new Map<string, Weekday>();
  for (const def of DEMO_WEEKLY) {
    const athleteId = ids.athleteIds.get(def.athlete);
    const athlete = athleteId ? await athletes.findWithPeople(athleteId) : null;
    if (!athlete) continue;
    const tz = athlete.user.timeZone;
    const dueToday = addDays(localDate(now, tz), -def.daysAgo);
    athlete.checkInWeekday = weekdayOf(dueToday);
    weekdays.set(athlete.id, athlete.checkInWeekday);
    for (const s of def.stored) {
      const dueDate = addDays(dueToday, -7 * s.weeksBack);
      const submittedAt = localInstant(dueDate, s.submittedAt, tz);
      const repliedAt = s.reply ? localInstant(addDays(dueDate, s.reply.daysAfter), s.reply.time, tz) : null;
      rows.push({
        athleteId: athlete.id,
        dueDate,
        questions: [...DEMO_CHECK_IN_QUESTIONS],
        answers: answersOf(s.answers),
        questionsForCoach: s.questionsForCoach,
        figures: await service.figures(dataSource.manager, athlete, dueDate),
        submittedAt,
        replyBody: s.reply?.body ?? null,
        repliedById: s.reply ? ids.ownerId : null,
        repliedAt,
        createdAt: submittedAt,
        updatedAt: repliedAt ?? submittedAt,
      });
    }
  }
  await dataSource.transaction(async (manager) => {
    await manager.query(
      `UPDATE "teams" SET "settings" = "settings" || jsonb_build_object('checkInQuestions', $2::jsonb) WHERE "id" = $1`,
      [ids.teamId, JSON.stringify(DEMO_CHECK_IN_QUESTIONS)],
    );
    for (const [athleteId, weekday] of weekdays) {
      await manager.update(Athlete, athleteId, { checkInWeekday: weekday });
    }
    const checkIns = new WeeklyCheckInRepository(manager);
    for (const row of rows) await checkIns.save(row);
  });
}
