import { describe, expect, it } from 'vitest';
import type { AcknowledgementView, DayTargets, GuardrailContext, PlanContent } from '../schemas/plans.js';
import type { Reader } from '../reader.js';
import { cautionsForDay } from './cautions.js';
import { checkGuardrails, GUARDRAIL_DEFAULTS } from './guardrails.js';
import { emptyDayTargets, starterPlanContent } from './resolve.js';

const day = (t: Partial<DayTargets>): DayTargets => ({ ...emptyDayTargets(), ...t });
const ctx: GuardrailContext = {
  baseline: { usualWaterMl: 3000, usualEnergyKcal: 2400, weightKg: 80, sex: 'female' },
  floors: GUARDRAIL_DEFAULTS,
  today: '2026-12-01',
  eventType: 'show',
  eventDate: '2026-12-05',
  weighInLimitKg: null,
};
const AT = '2026-12-01T09:00:00.000Z';

function content(): PlanContent {
  const c = starterPlanContent();
  // Rest day (Sunday) below the sodium adequate intake (NASEM 2019); the weekly pattern at 1,100 kcal
  // on training days is a fast loss (Garthe 2011).
  c.dayTypes[0]!.targets = day({ energy: { kind: 'kcal', kcal: 1500 } });
  c.dayTypes[1]!.targets = day({ energy: { kind: 'kcal', kcal: 1500 }, sodiumMg: 1200 });
  c.dates = [
    {
      date: '2026-12-03',
      label: 'Water cut',
      countdownOffset: -2,
      targets: day({ fluidCutoff: { time: '18:00', allowanceMl: 200 } }),
    },
    { date: '2026-12-05', label: 'Show day', countdownOffset: 0, targets: emptyDayTargets() },
  ];
  c.countdown = { templateId: null, templateName: 'Show week', eventDate: '2026-12-05', eventType: 'show' };
  return c;
}

function acknowledged(
  c: PlanContent,
): Pick<AcknowledgementView, 'code' | 'severity' | 'scope' | 'message' | 'source' | 'at'>[] {
  return checkGuardrails(c, ctx).map((w) => ({ ...w, at: AT }));
}

const ATHLETE: Reader = { units: { weight: 'kg', volume: 'ml' }, aboutAthlete: null };

describe('cautionsForDay', () => {
  it('the acknowledged warnings: rest-day sodium, the plan-wide loss rate, the water-cut day', () => {
    const c = content();
    expect(acknowledged(c).map((a) => `${a.code}:${a.scope.kind}`)).toEqual([
      'sodium_low:day_type',
      'fluid_restriction:date',
      'loss_rate:plan',
    ]);
  });

  it('a countdown day: the standing countdown caution (with the day label and the stop signs) leads', () => {
    const c = content();
    const cautions = cautionsForDay({
      content: c,
      date: '2026-12-03',
      acknowledgements: acknowledged(c),
      reader: ATHLETE,
    });
    expect(cautions.map((x) => x.code)).toEqual(['countdown', 'fluid_restriction', 'loss_rate']);
    expect(cautions[0]).toEqual({
      code: 'countdown',
      severity: 'strong',
      message: `E-2 of your countdown: water, sodium and energy change day by day.`,
      source: expect.stringContaining('Escalante'),
      acknowledgedAt: null,
    });
    expect(cautions[1]!.acknowledgedAt).toBe(AT);
  });

  it('E-0 carries the countdown caution even without a warning of its own', () => {
    const c = content();
    const cautions = cautionsForDay({
      content: c,
      date: '2026-12-05',
      acknowledgements: [],
      reader: ATHLETE,
    });
    expect(cautions.map((x) => x.message)).toEqual([
      `E-0 of your countdown: water, sodium and energy change day by day.`,
    ]);
  });

  it('a day-type warning covers the days that follow that type, not dated days', () => {
    const c = content();
    const acks = acknowledged(c);
    // Sunday 6 Dec follows the rest day.
    expect(
      cautionsForDay({ content: c, date: '2026-12-06', acknowledgements: acks, reader: ATHLETE }).map(
        (x) => x.code,
      ),
    ).toEqual(['sodium_low', 'loss_rate']);
    // Monday 7 Dec, a training day: only the plan-wide warning.
    expect(
      cautionsForDay({ content: c, date: '2026-12-07', acknowledgements: acks, reader: ATHLETE }).map(
        (x) => x.code,
      ),
    ).toEqual(['loss_rate']);
    // A dated day on a Sunday is not the rest day type.
    const sunday = {
      ...c,
      dates: [
        ...c.dates,
        { date: '2026-12-13', label: null, countdownOffset: null, targets: emptyDayTargets() },
      ],
    };
    expect(
      cautionsForDay({ content: sunday, date: '2026-12-13', acknowledgements: acks, reader: ATHLETE }).map(
        (x) => x.code,
      ),
    ).toEqual(['loss_rate']);
  });

  it('worded for staff and in the reader’s units', () => {
    const c = content();
    const coach: Reader = { units: { weight: 'lb', volume: 'floz' }, aboutAthlete: 'Mateo Ruiz' };
    const cautions = cautionsForDay({
      content: c,
      date: '2026-12-03',
      acknowledgements: acknowledged(c),
      reader: coach,
    });
    expect(cautions[0]!.message).toBe(
      "E-2 of Mateo's countdown: water, sodium and energy change day by day.",
    );
    // The stored warning says mL; a reader in fl oz reads fl oz (1 US fl oz = 29.5735295625 mL).
    const fluid = cautions.find((x) => x.code === 'fluid_restriction')!;
    expect(fluid.message).toMatch(/fl oz/);
    expect(fluid.message).not.toMatch(/mL/);
  });

  it('no plan-wide or day warnings and no countdown: no cautions', () => {
    expect(
      cautionsForDay({
        content: starterPlanContent(),
        date: '2026-12-07',
        acknowledgements: [],
        reader: ATHLETE,
      }),
    ).toEqual([]);
  });
});
