import { describe, expect, it } from 'vitest';
import {
  ACUTE_SHARE_DEFAULT_PCT,
  acknowledgementsNeeded,
  acuteShare,
  chronicRate,
  competitionDate,
  CUT_SOURCES,
  cutPathKg,
  cutWarnings,
  lossPct,
  rehearsalFigures,
  limitGap,
  limitGapSummary,
  preAcuteDate,
  rateSeverity,
  recoveryItemAmounts,
  recoveryTargets,
  recoveryWindowHours,
  type CutPlanShape,
} from './weight-cut.js';
import { STOP_SIGNS_TEXT } from '../consents.js';

// Invented cases worked out by hand; the thresholds' sources are named beside them in weight-cut.ts
// (Helms 2014 JISSN 11:20 and Garthe 2011 IJSNEM 21:97 for the weekly rate, Barley 2018 JSCR for the
// 5 % acute share, 7 % common practice, no source).

// 70 kg on Sun 1 Mar 2026, 66 kg planned before 3 acute days, weigh-in Wed 1 Apr 2026, limit 63 kg:
// the chronic part runs 1 Mar → 29 Mar = 28 days = 4 weeks, 4 kg = 1 kg a week.
const linear: CutPlanShape = {
  startDate: '2026-03-01',
  startKg: 70,
  preAcuteKg: 66,
  acuteDays: 3,
  weighInDate: '2026-04-01',
  limitKg: 63,
  path: 'linear',
};
const rate: CutPlanShape = { ...linear, path: 'rate' };

describe('the cut path: weight needed today to stay on plan', () => {
  it('ends the chronic part acuteDays before the weigh-in', () => {
    expect(preAcuteDate(linear)).toBe('2026-03-29');
  });

  it('linear: equal kg a day (day 14 of 28 → 70 − 4 × 14/28 = 68.0 kg)', () => {
    expect(cutPathKg(linear, '2026-03-01')).toEqual({ stage: 'chronic', kg: 70 });
    expect(cutPathKg(linear, '2026-03-15')).toEqual({ stage: 'chronic', kg: 68 });
    // Day 7: 70 − 4 × 7/28 = 69.0.
    expect(cutPathKg(linear, '2026-03-08').kg).toBeCloseTo(69, 10);
  });

  it('rate: the same share a day (day 14 of 28 → 70 × (66/70)^½ = √4620 = 67.9706 kg)', () => {
    expect(cutPathKg(rate, '2026-03-15').kg).toBeCloseTo(67.9706, 4);
  });

  it('holds the start weight before the start and the pre-acute weight through the acute days', () => {
    expect(cutPathKg(linear, '2026-02-28')).toEqual({ stage: 'before', kg: 70 });
    expect(cutPathKg(linear, '2026-03-29')).toEqual({ stage: 'acute', kg: 66 });
    expect(cutPathKg(linear, '2026-04-01')).toEqual({ stage: 'acute', kg: 66 });
    expect(cutPathKg(linear, '2026-04-02')).toEqual({ stage: 'after', kg: 66 });
  });
});

describe('the chronic weekly rate against 1 %/week (warning) and 1.4 %/week (strong)', () => {
  it('linear: the last week is the fastest in % (1 kg / 67 kg = 1.4925 %) → strong', () => {
    const r = chronicRate(linear)!;
    expect(r.kgPerWeek).toBeCloseTo(1, 10);
    expect(r.pctPerWeek).toBeCloseTo(1.4925, 4);
    expect(r.severity).toBe('strong');
  });

  it('rate: 1 − (66/70)^(1/4) = 1.4602 %/week every week → strong', () => {
    const r = chronicRate(rate)!;
    expect(r.pctPerWeek).toBeCloseTo(1.4602, 4);
    expect(r.severity).toBe('strong');
  });

  it('80 → 76 kg in 4 weeks, linear: 1 kg / 77 kg = 1.2987 % → warning; rate 1.2741 % → warning', () => {
    const plan = { ...linear, startKg: 80, preAcuteKg: 76 };
    expect(chronicRate(plan)!.pctPerWeek).toBeCloseTo(1.2987, 4);
    expect(chronicRate(plan)!.severity).toBe('warning');
    expect(chronicRate({ ...plan, path: 'rate' })!.pctPerWeek).toBeCloseTo(1.2741, 4);
  });

  it('reads the thresholds as "above": 1 and 1.4 exactly are not', () => {
    expect(rateSeverity(1)).toBe('none');
    expect(rateSeverity(1.01)).toBe('warning');
    expect(rateSeverity(1.4)).toBe('warning');
    expect(rateSeverity(1.41)).toBe('strong');
  });

  it('has no rate when the chronic part has no days', () => {
    expect(chronicRate({ ...linear, startDate: '2026-03-29' })).toBeNull();
  });
});

describe('the acute share: pre-acute weight down to the limit', () => {
  it('66 → 63 kg: 3 kg, 3/66 = 4.5455 % → under the default 5 %', () => {
    const a = acuteShare(66, 63);
    expect(a.kg).toBe(3);
    expect(a.pct).toBeCloseTo(4.5455, 4);
    expect(a.severity).toBe('none');
    expect(ACUTE_SHARE_DEFAULT_PCT).toBe(5);
  });

  it('67 → 63 kg: 4/67 = 5.9701 % → strong, one acknowledgement', () => {
    const a = acuteShare(67, 63);
    expect(a.pct).toBeCloseTo(5.9701, 4);
    expect(a.severity).toBe('strong');
    expect(acknowledgementsNeeded(a.severity)).toEqual(['acute_share']);
  });

  it('68 → 63 kg: 5/68 = 7.3529 % → severe, two acknowledgements', () => {
    const a = acuteShare(68, 63);
    expect(a.pct).toBeCloseTo(7.3529, 4);
    expect(a.severity).toBe('severe');
    expect(acknowledgementsNeeded(a.severity)).toEqual(['acute_share', 'acute_share_severe']);
  });

  it('exactly the threshold (60 → 57 kg = 5 %) is not above it; a team threshold of 4 % is', () => {
    expect(acuteShare(60, 57).severity).toBe('none');
    expect(acuteShare(66, 63, 4).severity).toBe('strong');
  });

  it('needs nothing when the pre-acute weight is already under the limit', () => {
    expect(acuteShare(62, 63)).toEqual({ kg: 0, pct: 0, severity: 'none' });
  });
});

describe('the projection at the weigh-in against the limit', () => {
  it('63.6 projected against 63.0 with 10 days left at 64.4 kg: 0.6 kg over, 0.6/(10/7)/64.4 = 0.6522 %/week more', () => {
    const g = limitGap({
      projection: { kg: 63.6, lowKg: 62.3 },
      limitKg: 63,
      currentKg: 64.4,
      today: '2026-03-22',
      weighInDate: '2026-04-01',
    });
    expect(g.over).toBe(true);
    expect(g.overKg).toBeCloseTo(0.6, 10);
    // 0.6 / 63 = 0.9524 % of the limit.
    expect(g.overPct).toBeCloseTo(0.9524, 4);
    expect(g.daysLeft).toBe(10);
    expect(g.extraPctPerWeek).toBeCloseTo(0.6522, 4);
    expect(g.rangeOver).toBe(false);
  });

  it('under the limit: no extra rate; the whole range over the limit is told apart', () => {
    const base = { limitKg: 63, currentKg: 64, today: '2026-03-22', weighInDate: '2026-04-01' };
    const under = limitGap({ ...base, projection: { kg: 62.5, lowKg: 61.5 } });
    expect(under.over).toBe(false);
    expect(under.overKg).toBeCloseTo(-0.5, 10);
    expect(under.extraPctPerWeek).toBeNull();
    expect(limitGap({ ...base, projection: { kg: 64, lowKg: 63.2 } }).rangeOver).toBe(true);
  });
});

describe('the recovery window on the venue clock', () => {
  it('day before: weigh-in 18:00 Tue 31 Mar, competition 10:00 the next day → 16 h', () => {
    const w = {
      weighInDate: '2026-03-31',
      weighInTime: '18:00',
      timing: 'day_before' as const,
      competitionTime: '10:00',
      timeZone: 'Pacific/Auckland',
    };
    expect(competitionDate(w)).toBe('2026-04-01');
    expect(recoveryWindowHours(w)).toBe(16);
  });

  it('same day: 07:00 → 13:00 = 6 h', () => {
    expect(
      recoveryWindowHours({
        weighInDate: '2026-04-01',
        weighInTime: '07:00',
        timing: 'same_day',
        competitionTime: '13:00',
        timeZone: 'Europe/London',
      }),
    ).toBe(6);
  });

  it('counts the hour New Zealand gains at 03:00 on Sun 5 Apr 2026 (18:00 → 10:00 is 17 h)', () => {
    // NZ daylight saving ends on the first Sunday of April (IANA tz database, Pacific/Auckland).
    expect(
      recoveryWindowHours({
        weighInDate: '2026-04-04',
        weighInTime: '18:00',
        timing: 'day_before',
        competitionTime: '10:00',
        timeZone: 'Pacific/Auckland',
      }),
    ).toBe(17);
  });
});

describe('recovery targets from the kg lost at the scale', () => {
  it('3 kg lost, 63 kg, 16 h: 4.5 L; carbohydrate 4.0–4.8 g/kg for 4 h + 5–10 g/kg × 12/24 = 6.5–9.8 g/kg', () => {
    const r = recoveryTargets({ kgLost: 3, bodyKg: 63, windowHours: 16 });
    expect(r.fluidL).toBeCloseTo(4.5, 10);
    expect(r.carbohydrateGPerKg.min).toBeCloseTo(6.5, 10);
    expect(r.carbohydrateGPerKg.max).toBeCloseTo(9.8, 10);
    // 6.5 × 63 = 409.5 g; 9.8 × 63 = 617.4 g.
    expect(r.carbohydrateG.min).toBeCloseTo(409.5, 10);
    expect(r.carbohydrateG.max).toBeCloseTo(617.4, 10);
    // Slots every hour until an hour before: 0, 60, …, 900 minutes = 16 slots of 4.5/16 = 0.28125 L.
    expect(r.slots).toHaveLength(16);
    expect(r.slots[15]!.minutesAfterWeighIn).toBe(900);
    expect(r.slots[0]!.fluidL).toBeCloseTo(0.28125, 10);
    // First hour: 1.0–1.2 g/kg × 63 = 63–75.6 g; last hour (15–16 h): 5/24–10/24 × 63 = 13.125–26.25 g.
    expect(r.slots[0]!.carbohydrateG.min).toBeCloseTo(63, 10);
    expect(r.slots[0]!.carbohydrateG.max).toBeCloseTo(75.6, 10);
    expect(r.slots[15]!.carbohydrateG.min).toBeCloseTo(13.125, 10);
    expect(r.slots[15]!.carbohydrateG.max).toBeCloseTo(26.25, 10);
    const sum = r.slots.reduce((a, s) => a + s.carbohydrateG.min, 0);
    expect(sum).toBeCloseTo(409.5, 8);
  });

  it('2 kg lost, 60 kg, 3 h: 3.0 L in 3 slots of 1.0 L; 3.0–3.6 g/kg = 180–216 g, 60–72 g an hour', () => {
    const r = recoveryTargets({ kgLost: 2, bodyKg: 60, windowHours: 3 });
    expect(r.fluidL).toBeCloseTo(3, 10);
    expect(r.carbohydrateG.min).toBeCloseTo(180, 10);
    expect(r.carbohydrateG.max).toBeCloseTo(216, 10);
    expect(r.slots.map((s) => s.minutesAfterWeighIn)).toEqual([0, 60, 120]);
    for (const s of r.slots) {
      expect(s.fluidL).toBeCloseTo(1, 10);
      expect(s.carbohydrateG.min).toBeCloseTo(60, 10);
      expect(s.carbohydrateG.max).toBeCloseTo(72, 10);
    }
  });

  it('keeps one slot for a window under an hour and asks no fluid when nothing was lost', () => {
    const r = recoveryTargets({ kgLost: -0.2, bodyKg: 60, windowHours: 0.5 });
    expect(r.fluidL).toBe(0);
    expect(r.slots).toHaveLength(1);
  });
});

describe('the words of the warnings and the gap', () => {
  it('asks one acknowledgement per warning: rate, acute share, and the second above 7 %', () => {
    const keys = cutWarnings(chronicRate(linear), acuteShare(68, 63), 5).map((w) => [w.key, w.severity]);
    expect(keys).toEqual([
      ['chronic_rate', 'strong'],
      ['acute_share', 'strong'],
      ['acute_share_severe', 'severe'],
    ]);
    // Only the severe one carries the signs to stop and seek care.
    const signs = cutWarnings(chronicRate(linear), acuteShare(68, 63), 5).map((w) => w.stopSigns);
    expect(signs).toEqual([null, null, STOP_SIGNS_TEXT]);
    expect(cutWarnings(null, acuteShare(66, 63), 5)).toEqual([]);
  });

  it('says the gap in kg, days and the extra rate', () => {
    const gap = limitGap({
      projection: { kg: 63.6, lowKg: 62.3 },
      limitKg: 63,
      currentKg: 64.4,
      today: '2026-03-22',
      weighInDate: '2026-04-01',
    });
    expect(limitGapSummary(gap, 63)).toBe(
      'Projected 0.6 kg over the 63.0 kg limit in 10 days; needs 0.7 %/week more',
    );
  });
});

describe('the sources the acute-share warnings carry', () => {
  it('marks the 7 % line common practice and cites the ACSM consensus statement for no numeric limit', () => {
    const [share, severe] = cutWarnings(null, acuteShare(68, 63), 5);
    // Burke et al. 2021, Curr Sports Med Rep 20:199–217 (REFERENCES §7): no numeric limit given.
    expect(share!.source).toContain('Barley et al. 2018');
    expect(share!.source).toContain('no numeric safe % confirmed');
    expect(severe!.source).toContain('common practice, no source');
    expect(severe!.source).toContain('Curr Sports Med Rep 20:199–217');
    expect(CUT_SOURCES.acuteShareSevere).toContain('confirms no numeric limit');
  });
});

describe('what ticking a recovery slot logs', () => {
  it('rounds the fluid to 10 mL and takes the carbohydrate band’s floor in whole grams', () => {
    // 5.25 L over 16 slots = 328.125 mL → 330 mL; sodium 0.33 L × 20 mmol/L × 22.99 mg/mmol
    // (Sawka 2007, from memory) = 151.7 → 152 mg; 1.0–1.2 g/kg × 63 kg = 63–75.6 g → 63 g.
    expect(recoveryItemAmounts({ fluidL: 5.25 / 16, carbohydrateG: { min: 63, max: 75.6 } })).toEqual({
      volumeMl: 330,
      sodiumMg: 152,
      carbohydrateG: 63,
    });
    // 0.3249 L → 320 mL (324.9 rounds down), 0.32 × 459.8 = 147.1 → 147 mg; 40.5 g → 41 g (half up).
    expect(recoveryItemAmounts({ fluidL: 0.3249, carbohydrateG: { min: 40.5, max: 60 } })).toEqual({
      volumeMl: 320,
      sodiumMg: 147,
      carbohydrateG: 41,
    });
  });
});

describe("a rehearsal's record", () => {
  it('reads body-mass loss as (pre − post) / pre: 80 kg → 78.4 kg is 2 % (REFERENCES §5, Sawka 2007 ACSM)', () => {
    expect(lossPct(80, 78.4)).toBeCloseTo(2, 10);
    expect(lossPct(80, 79.2)).toBeCloseTo(1, 10);
  });

  // Invented case, worked by hand. Practice weigh-in Fri 2026-03-13 after 3 acute days, so the
  // acute part starts Tue 03-10 (the start morning); regain read on Sat 03-14 and Sun 03-15.
  //   03-09 66.0 (before the rehearsal: ignored)
  //   03-10 66.0 start
  //   03-11 65.2 lost 0.8 kg = 0.8/66.0 = 1.21212 %
  //   03-12 (no weigh-in)            → no loss that day
  //   03-13 63.6 weigh-in            → no loss either (no 03-12 weight to compare with)
  //   03-14 65.1 regained 1.5 kg = 1.5/63.6 = 2.35849 % of the weigh-in weight,
  //              1.5/2.4 = 62.5 % of the 2.4 kg lost (66.0 → 63.6 = 3.63636 %)
  //   03-15 65.7 regained 2.1 kg = 3.30189 %, 87.5 % of the loss
  //   03-16 66.0 (after the regain mornings: ignored)
  const weighIns = [
    { date: '2026-03-09', kg: 66.0 },
    { date: '2026-03-10', kg: 66.0 },
    { date: '2026-03-11', kg: 65.2 },
    { date: '2026-03-13', kg: 63.6 },
    { date: '2026-03-14', kg: 65.1 },
    { date: '2026-03-15', kg: 65.7 },
    { date: '2026-03-16', kg: 66.0 },
  ];
  const r = rehearsalFigures({ preAcuteDate: '2026-03-10', weighInDate: '2026-03-13', weighIns });

  it('lists the start, each acute day, the weigh-in and two mornings after', () => {
    expect(r.days.map((d) => [d.date, d.stage, d.kg])).toEqual([
      ['2026-03-10', 'start', 66.0],
      ['2026-03-11', 'acute', 65.2],
      ['2026-03-12', 'acute', null],
      ['2026-03-13', 'weigh_in', 63.6],
      ['2026-03-14', 'after', 65.1],
      ['2026-03-15', 'after', 65.7],
    ]);
  });

  it("counts each day's loss against the day before, never across a missing day", () => {
    expect(r.days[0]).toMatchObject({ lostKg: null, lostPct: null });
    expect(r.days[1]!.lostKg).toBeCloseTo(0.8, 10);
    expect(r.days[1]!.lostPct).toBeCloseTo(1.21212, 5);
    expect(r.days[2]).toMatchObject({ lostKg: null, lostPct: null });
    expect(r.days[3]).toMatchObject({ lostKg: null, lostPct: null });
  });

  it('totals the start to the weigh-in, and the regain by the next mornings', () => {
    expect(r.achieved!.fromKg).toBe(66.0);
    expect(r.achieved!.toKg).toBe(63.6);
    expect(r.achieved!.kg).toBeCloseTo(2.4, 10);
    expect(r.achieved!.pct).toBeCloseTo(3.63636, 5);
    expect(r.regained.map((g) => g.date)).toEqual(['2026-03-14', '2026-03-15']);
    expect(r.regained[0]!.kg).toBeCloseTo(1.5, 10);
    expect(r.regained[0]!.pct).toBeCloseTo(2.35849, 5);
    expect(r.regained[0]!.shareOfLossPct).toBeCloseTo(62.5, 8);
    expect(r.regained[1]!.kg).toBeCloseTo(2.1, 10);
    expect(r.regained[1]!.pct).toBeCloseTo(3.30189, 5);
    expect(r.regained[1]!.shareOfLossPct).toBeCloseTo(87.5, 8);
  });

  it('has no total without the start or the weigh-in weight, and no regain without the weigh-in', () => {
    const noStart = rehearsalFigures({
      preAcuteDate: '2026-03-10',
      weighInDate: '2026-03-13',
      weighIns: weighIns.filter((w) => w.date !== '2026-03-10'),
    });
    expect(noStart.achieved).toBeNull();
    expect(noStart.regained[0]!.shareOfLossPct).toBeNull();
    const noWeighIn = rehearsalFigures({
      preAcuteDate: '2026-03-10',
      weighInDate: '2026-03-13',
      weighIns: weighIns.filter((w) => w.date !== '2026-03-13'),
    });
    expect(noWeighIn.achieved).toBeNull();
    expect(noWeighIn.regained).toEqual([]);
  });
});
