import { describe, expect, it } from 'vitest';
import { addDays, localDate } from './calendar.js';
import { DEMO_ATHLETES } from './demo-team.js';
import { planDemoHistory } from './seed-history.js';
import { planDemoMarks } from './seed-marks.js';

describe('demo marks', () => {
  for (const now of [new Date('2026-12-01T11:30:00Z'), new Date('2027-03-14T23:50:00Z')]) {
    const plans = planDemoHistory(DEMO_ATHLETES, now);
    const marks = planDemoMarks(plans);

    it(`sits on each athlete's history, in order (seeded ${now.toISOString()})`, () => {
      expect(marks.map((m) => m.athlete).sort()).toEqual(
        ['final_week', 'final_week', 'long_diet', 'regain', 'skips_check_ins', 'weigh_in'].sort(),
      );
      for (const m of marks) {
        const plan = plans.find((p) => p.def.key === m.athlete)!;
        const first = plan.history.days[0]!.daysBeforeSeed;
        expect(m.fromT, m.note).toBeGreaterThanOrEqual(m.toT);
        expect(m.toT, m.note).toBeGreaterThanOrEqual(1);
        expect(m.fromT, m.note).toBeLessThanOrEqual(first);
        // Written on or after the last marked day; replies and reads after the mark.
        expect(m.at.t, m.note).toBeLessThanOrEqual(m.toT);
        for (const later of [m.reply?.at, m.athleteReadAt, m.authorReadAt]) {
          if (!later) continue;
          expect(later.t * 1440 - minutes(later.time), m.note).toBeLessThanOrEqual(
            m.at.t * 1440 - minutes(m.at.time),
          );
        }
        if (m.authorReadAt && m.reply) {
          expect(m.authorReadAt.t * 1440 - minutes(m.authorReadAt.time)).toBeLessThan(
            m.reply.at.t * 1440 - minutes(m.reply.at.time),
          );
        }
        if (m.author === 'assistant') expect(plan.def.sharedWithAssistant, m.note).toBe(true);
      }
    });

    it(`marks missed weigh-ins only on days without one, and a refeed morning after one (${now.toISOString()})`, () => {
      const missed = marks.find((m) => m.athlete === 'skips_check_ins')!;
      const skipper = plans.find((p) => p.def.key === 'skips_check_ins')!.history;
      const run = skipper.days.filter(
        (d) => d.daysBeforeSeed <= missed.fromT && d.daysBeforeSeed >= missed.toT,
      );
      expect(run.length).toBe(missed.fromT - missed.toT + 1);
      expect(run.every((d) => !d.weighIn)).toBe(true);
      expect(missed.note.startsWith(['Two', 'Three', 'Four', 'Five', 'Six', 'Seven'][run.length - 2]!)).toBe(
        true,
      );
      // The day after the run has a weigh-in again (she is back).
      expect(skipper.days.find((d) => d.daysBeforeSeed === missed.toT - 1)?.weighIn).toBeTruthy();
      expect(missed.reply).toBeDefined();
      expect(missed.authorReadAt).toBeUndefined();

      const refeed = marks.find((m) => m.athlete === 'long_diet')!;
      const diet = plans.find((p) => p.def.key === 'long_diet')!;
      const day = diet.history.days.find((d) => d.daysBeforeSeed === refeed.fromT)!;
      expect(day.weighIn?.tags).toContain('high_carb_meal');
      expect(day.date).toBe(addDays(localDate(now, diet.def.timeZone), -refeed.fromT));
    });
  }
});

function minutes(time: string): number {
  const [h, m] = time.split(':').map(Number) as [number, number];
  return h * 60 + m;
}
