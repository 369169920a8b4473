import {
  eveningRequest,
  fluidEntryRequest,
  mealEntryRequest,
  supplementEntryRequest,
  symptomReportRequest,
  URGENT_SYMPTOMS,
  weighInRequest,
} from '@driftmark/shared';
import { describe, expect, it } from 'vitest';
import { addDays, daysBetween } from './calendar.js';
import { DEMO_ATHLETES, type DemoAthleteDefinition, type DemoSituation } from './demo-team.js';
import { generateHistory, type AthleteHistory, type GeneratedDay } from './history.js';

const seedDate = '2026-12-01';
const histories = new Map<DemoSituation, AthleteHistory>(
  DEMO_ATHLETES.map((def) => [def.key, generateHistory(def, { seedDate })]),
);
const historyOf = (key: DemoSituation) => histories.get(key)!;
const defOf = (key: DemoSituation) => DEMO_ATHLETES.find((d) => d.key === key)!;
const weighed = (days: GeneratedDay[]) => days.filter((d) => d.weighIn !== null);

function sd(xs: number[]): number {
  const mean = xs.reduce((a, b) => a + b, 0) / xs.length;
  return Math.sqrt(xs.reduce((a, x) => a + (x - mean) ** 2, 0) / (xs.length - 1));
}

/** Ordinary least squares of weight on day number: slope per day and residuals. */
function linearFit(days: GeneratedDay[]): { slope: number; residuals: number[] } {
  const pts = weighed(days).map((d) => ({ x: -d.daysBeforeSeed, y: d.weighIn!.weightKg }));
  const mx = pts.reduce((a, p) => a + p.x, 0) / pts.length;
  const my = pts.reduce((a, p) => a + p.y, 0) / pts.length;
  const slope =
    pts.reduce((a, p) => a + (p.x - mx) * (p.y - my), 0) / pts.reduce((a, p) => a + (p.x - mx) ** 2, 0);
  return { slope, residuals: pts.map((p) => p.y - (my + slope * (p.x - mx))) };
}

describe('generateHistory', () => {
  it('gives the same days for the same seed and inputs', () => {
    for (const def of DEMO_ATHLETES) {
      expect(generateHistory(def, { seedDate })).toEqual(historyOf(def.key));
    }
  });

  it('gives each athlete a different history', () => {
    const series = DEMO_ATHLETES.map((def) =>
      historyOf(def.key)
        .days.map((d) => d.weighIn?.weightKg ?? '-')
        .join(','),
    );
    expect(new Set(series).size).toBe(DEMO_ATHLETES.length);
    // The same situation with another seed differs too.
    const def = defOf('long_diet');
    const other = generateHistory({ ...def, history: { ...def.history, seed: 999 } }, { seedDate });
    expect(other.days.map((d) => d.weighIn?.weightKg)).not.toEqual(
      historyOf('long_diet').days.map((d) => d.weighIn?.weightKg),
    );
  });

  it('covers the days after intake up to the day before the seed date, never later', () => {
    for (const history of histories.values()) {
      const dates = history.days.map((d) => d.date);
      expect(dates).toHaveLength(119);
      expect(dates.at(-1)).toBe(addDays(seedDate, -1));
      expect(dates[0]).toBe(addDays(seedDate, -119));
      dates.forEach((date, i) => i > 0 && expect(daysBetween(dates[i - 1]!, date)).toBe(1));
    }
    const endingToday = generateHistory(defOf('final_week'), { seedDate, endDate: seedDate, days: 30 });
    expect(endingToday.days).toHaveLength(30);
    expect(endingToday.days.every((d) => d.date <= seedDate)).toBe(true);
    expect(endingToday.days.at(-1)!.date).toBe(seedDate);
  });

  it('leaves missed days empty, gives everyone a few and the skipper many', () => {
    for (const history of histories.values()) {
      const missed = history.days.filter((d) => d.missed);
      expect(missed.length, history.key).toBeGreaterThanOrEqual(2);
      for (const day of missed) {
        expect(day.weighIn).toBeNull();
        expect([day.fluids, day.meals, day.supplements, day.symptoms].every((l) => l.length === 0)).toBe(
          true,
        );
        expect(day.evening).toBeNull();
      }
      for (const day of history.days.filter((d) => !d.missed)) {
        expect(day.weighIn !== null || day.fluids.length + day.meals.length > 0 || day.evening !== null).toBe(
          true,
        );
      }
    }
    const logged = (key: DemoSituation) => historyOf(key).days.filter((d) => !d.missed).length / 119;
    expect(logged('skips_check_ins')).toBeGreaterThan(0.38);
    expect(logged('skips_check_ins')).toBeLessThan(0.52);
    const skipperWeighIns = weighed(historyOf('skips_check_ins').days).length;
    for (const def of DEMO_ATHLETES.filter((d) => d.key !== 'skips_check_ins')) {
      expect(logged(def.key), def.key).toBeGreaterThan(0.84);
      expect(skipperWeighIns).toBeLessThan(weighed(historyOf(def.key).days).length * 0.6);
    }
  });

  it('scatters weigh-ins like real first-morning body mass (Cheuvront 2004: about 0.5 kg, CV 0.66 %)', () => {
    // A stable athlete: residuals from a straight line are the day-to-day noise.
    const base = defOf('long_diet');
    const stable: DemoAthleteDefinition = {
      ...base,
      history: { ...base.history, startWeightKg: 70, seedDateWeightKg: 70 },
    };
    const { slope, residuals } = linearFit(generateHistory(stable, { seedDate }).days);
    expect(Math.abs(slope * 7)).toBeLessThan(0.15);
    expect(sd(residuals)).toBeGreaterThan(0.3);
    expect(sd(residuals)).toBeLessThan(0.8);

    // Every demo athlete scatters around their own curve by a similar amount (CV under 1 %).
    for (const history of histories.values()) {
      const days = weighed(history.days);
      const residual = days.map((d) => d.weighIn!.weightKg - d.modelKg);
      expect(sd(residual), history.key).toBeGreaterThan(0.3);
      expect(sd(residual), history.key).toBeLessThan(0.8);
      const cv = sd(residual) / (days.reduce((a, d) => a + d.modelKg, 0) / days.length);
      expect(cv, history.key).toBeLessThan(0.01);
    }
  });

  it('tags salty meals, travel and poor sleep with an upward bump', () => {
    const residualsBy = (tagged: boolean) =>
      [...histories.values()].flatMap((h) =>
        weighed(h.days)
          .filter(
            (d) => d.weighIn!.tags.some((t) => ['salty_meal', 'travel', 'poor_sleep'].includes(t)) === tagged,
          )
          .map((d) => d.weighIn!.weightKg - d.modelKg),
      );
    const mean = (xs: number[]) => xs.reduce((a, b) => a + b, 0) / xs.length;
    const tagged = residualsBy(true);
    expect(tagged.length).toBeGreaterThan(20);
    expect(mean(tagged) - mean(residualsBy(false))).toBeGreaterThan(0.2);
    // Poor sleep on the weigh-in goes with a short night on that day's evening card.
    for (const h of histories.values()) {
      for (const d of h.days.filter((d) => d.weighIn?.tags.includes('poor_sleep') && d.evening)) {
        expect(d.evening!.sleepHours).toBeLessThan(6);
      }
    }
  });

  it('follows each athlete’s situation', () => {
    const kg = (key: DemoSituation, from: number, to: number) => {
      const days = weighed(historyOf(key).days).filter(
        (d) => d.daysBeforeSeed <= from && d.daysBeforeSeed >= to,
      );
      return days.reduce((a, d) => a + d.weighIn!.weightKg, 0) / days.length;
    };
    // Countdown: dieted from the mid-80s to about 80, then the final week's dip.
    expect(kg('final_week', 119, 113) - kg('final_week', 10, 4)).toBeGreaterThan(5);
    expect(kg('final_week', 3, 1)).toBeLessThan(kg('final_week', 10, 4) - 0.3);
    // Weigh-in: cutting toward the −63 kg limit, still above it with ten days to go (enough that the
    // projection at the weigh-in is over the limit: the making-weight demo).
    expect(kg('weigh_in', 7, 1)).toBeGreaterThan(63);
    expect(kg('weigh_in', 7, 1)).toBeLessThan(66);
    expect(kg('weigh_in', 119, 100) - kg('weigh_in', 7, 1)).toBeGreaterThan(1.5);
    // Long diet: 0.5–0.8 % of body mass a week.
    const long = linearFit(historyOf('long_diet').days);
    const rate = (-long.slope * 7) / kg('long_diet', 119, 1);
    expect(rate).toBeGreaterThan(0.005);
    expect(rate).toBeLessThan(0.008);
    // Regain: rising after the show three weeks ago.
    expect(kg('regain', 7, 1) - kg('regain', 24, 21)).toBeGreaterThan(1.5);
    expect(kg('regain', 119, 113)).toBeGreaterThan(kg('regain', 24, 21) + 4);
    // Photo shoot and the skipper: steady loss.
    expect(linearFit(historyOf('photo_shoot').days).slope).toBeLessThan(0);
    expect(linearFit(historyOf('skips_check_ins').days).slope).toBeLessThan(0);
  });

  it('eats near the usual energy less the deficit, and drinks near the usual volume', () => {
    for (const def of DEMO_ATHLETES) {
      const days = historyOf(def.key).days;
      const eaten = days.filter((d) => d.meals.length > 0 && d.daysBeforeSeed > 21);
      const kcal =
        eaten.reduce((a, d) => a + d.meals.reduce((s, m) => s + m.energyKcal, 0), 0) / eaten.length;
      expect(kcal / def.intake.usualEnergyKcal, def.key).toBeGreaterThan(0.7);
      expect(kcal / def.intake.usualEnergyKcal, def.key).toBeLessThan(0.97);
      const drank = days.filter((d) => d.fluids.length > 0);
      const ml = drank.reduce((a, d) => a + d.fluids.reduce((s, f) => s + f.volumeMl, 0), 0) / drank.length;
      expect(ml / def.intake.usualWaterMl, def.key).toBeGreaterThan(0.75);
      expect(ml / def.intake.usualWaterMl, def.key).toBeLessThan(1.2);
    }
    // After the show the regaining athlete eats more than usual.
    const after = historyOf('regain').days.filter((d) => d.meals.length > 0 && d.daysBeforeSeed < 18);
    const kcal = after.reduce((a, d) => a + d.meals.reduce((s, m) => s + m.energyKcal, 0), 0) / after.length;
    expect(kcal).toBeGreaterThan(defOf('regain').intake.usualEnergyKcal);
  });

  it('produces entries the API itself would accept (shared schemas and LIMITS)', () => {
    for (const def of DEMO_ATHLETES) {
      const clientIds = new Set<string>();
      for (const day of historyOf(def.key).days) {
        const where = `${def.key} ${day.date}`;
        if (day.weighIn) {
          const w = day.weighIn;
          const parsed = weighInRequest.safeParse({
            weight: w.entered.value,
            unit: w.entered.unit,
            time: w.time,
            protocolConfirmed: true,
            tags: w.tags,
            cyclePhase: w.cyclePhase,
          });
          expect(parsed.success, where).toBe(true);
          expect(w.entered.unit).toBe(def.weightUnit);
        }
        for (const f of day.fluids) {
          const { entered, ...rest } = f;
          expect(
            fluidEntryRequest.safeParse({ ...rest, volume: entered.value, unit: entered.unit }).success,
          ).toBe(true);
          expect(entered.unit).toBe(def.volumeUnit);
        }
        for (const m of day.meals) expect(mealEntryRequest.safeParse(m).success, where).toBe(true);
        for (const s of day.supplements)
          expect(supplementEntryRequest.safeParse(s).success, where).toBe(true);
        for (const s of day.symptoms) expect(symptomReportRequest.safeParse(s).success, where).toBe(true);
        if (day.evening) expect(eveningRequest.safeParse(day.evening).success, where).toBe(true);
        if (!day.missed && day.fluids.length > 0) {
          expect(day.fluids.length).toBeGreaterThanOrEqual(3);
          expect(day.fluids.length).toBeLessThanOrEqual(7);
        }
        if (day.meals.length > 0) {
          expect(day.meals.length).toBeGreaterThanOrEqual(3);
          expect(day.meals.length).toBeLessThanOrEqual(5);
        }
        // Clock order within each kind, and the weigh-in before the first meal and drink.
        for (const list of [day.fluids, day.meals, day.supplements]) {
          expect(list.map((e) => e.time)).toEqual(list.map((e) => e.time).sort());
        }
        if (day.weighIn && day.meals[0]) expect(day.weighIn.time < day.meals[0].time).toBe(true);
        if (day.weighIn && day.fluids[0]) expect(day.weighIn.time < day.fluids[0].time).toBe(true);
        for (const e of [...day.fluids, ...day.meals, ...day.supplements, ...day.symptoms]) {
          expect(clientIds.has(e.clientId), where).toBe(false);
          clientIds.add(e.clientId);
        }
      }
    }
  });

  it('reports symptoms rarely, the only urgent one being the countdown athlete’s dizziness two days ago', () => {
    const urgent = [...histories.values()].flatMap((h) =>
      h.days.flatMap((d) => d.symptoms.filter((s) => s.urgent).map((s) => ({ key: h.key, day: d, s }))),
    );
    expect(urgent).toHaveLength(1);
    expect(urgent[0]!.key).toBe('final_week');
    expect(urgent[0]!.day.daysBeforeSeed).toBe(2);
    expect(urgent[0]!.s.symptoms).toEqual(['dizziness']);
    for (const h of histories.values()) {
      const reports = h.days.flatMap((d) => d.symptoms);
      expect(reports.length, h.key).toBeLessThanOrEqual(2);
      for (const r of reports) {
        expect(r.urgent).toBe(r.symptoms.some((s) => (URGENT_SYMPTOMS as readonly string[]).includes(s)));
      }
    }
  });
});
