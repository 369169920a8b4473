import {
  GUARDRAIL_DEFAULTS,
  dayView,
  guardrailWarning,
  planVersionView,
  planView,
  type GuardrailWarning,
} from '@driftmark/shared';
import { afterAll, beforeAll, beforeEach, describe, expect, it } from 'vitest';
import { Athlete } from '../../api/src/entities/athlete.entity.js';
import type { User } from '../../api/src/entities/user.entity.js';
import { PlanRepository } from '../../api/src/repositories/plan.repository.js';
import { createAthlete, type CreatedAthlete } from '../factories/athletes.js';
import { FACTORY_PASSWORD } from '../factories/password.js';
import { createCoach, createOwner } from '../factories/users.js';
import { weighInBody } from './check-ins-helpers.js';
import {
  countPlanRows,
  planContent,
  planRows,
  safeTargets,
  supplement,
  versionBody,
} from './plans-helpers.js';
import { buildTestApp, signedIn, type TestApp } from './setup/app.js';

// Tuesday 1 December 2026, 11:00 in Madrid (UTC+1).
const TODAY = '2026-12-01';
let now = new Date('2026-12-01T10:00:00Z');

let t: TestApp;
beforeAll(async () => {
  t = await buildTestApp({}, { clock: () => now });
});
afterAll(() => t.close());

let owner: User;
let coach: User;
let me: CreatedAthlete;
let coachAgent: Awaited<ReturnType<typeof signedIn>>;
let base: string;

beforeEach(async () => {
  now = new Date('2026-12-01T10:00:00Z');
  await t.reset();
  owner = await createOwner(t.dataSource);
  coach = await createCoach(t.dataSource, { teamId: owner.teamId });
  me = await createAthlete(t.dataSource, { coach, user: { timeZone: 'Europe/Madrid' } });
  coachAgent = await signedIn(t.app, coach.email, FACTORY_PASSWORD);
  base = `/api/athletes/${me.athlete.id}`;
});

const dayAs = async (agent: typeof coachAgent, date: string) => {
  const res = await agent.get(`${base}/days/${date}`);
  expect(res.status).toBe(200);
  return dayView.parse(res.body.data);
};
const day = (date: string) => dayAs(coachAgent, date);

const create = (body: Record<string, unknown>) => coachAgent.post(`${base}/plan/versions`).send(body);

/** Saves a version, acknowledging whatever the server warns about. */
async function createAcknowledged(body: Record<string, unknown>) {
  const first = await create(body);
  if (first.status !== 409) return first;
  return create({ ...body, acknowledgedKeys: Object.keys(first.body.error.fields) });
}

describe('the plan view', () => {
  it('is empty before the first version, with the baseline now and the default floors', async () => {
    const res = await coachAgent.get(`${base}/plan`);
    expect(res.status).toBe(200);
    const view = planView.parse(res.body.data);
    expect(view).toMatchObject({
      athleteId: me.athlete.id,
      today: TODAY,
      versions: [],
      current: null,
      latest: null,
    });
    expect(view.baseline).toEqual({
      usualWaterMl: 2500,
      usualEnergyKcal: 2100,
      weightKg: null,
      sex: 'female',
    });
    expect(view.floors).toEqual(GUARDRAIL_DEFAULTS);
    expect(res.body.abilities).toEqual({ edit: true });
    const athlete = await signedIn(t.app, me.user.email, FACTORY_PASSWORD);
    const own = await athlete.get(`${base}/plan`);
    expect(own.status).toBe(200);
    expect(own.body.abilities).toEqual({ edit: false });
  });

  it('takes the trend weight over the last 60 days of weigh-ins (EWMA α 0.1, Walker, The Hacker’s Diet)', async () => {
    const athlete = await signedIn(t.app, me.user.email, FACTORY_PASSWORD);
    // 61 days ago is outside the window; then 80.0 and 80.4 → T = 80.0 + 0.1·0.4 = 80.04 (REFERENCES.md §8 day 2).
    for (const [date, weight] of [
      ['2026-10-01', 95],
      ['2026-11-29', 80.0],
      ['2026-11-30', 80.4],
    ] as const) {
      await athlete.put(`${base}/days/${date}/weigh-in`).send(weighInBody({ weight }));
    }
    const view = planView.parse((await coachAgent.get(`${base}/plan`)).body.data);
    expect(view.baseline.weightKg).toBeCloseTo(80.04, 9);
  });
});

describe('saving versions', () => {
  it('stores a version from today with who, when, why and the baseline snapshot', async () => {
    const res = await create(versionBody(TODAY));
    expect(res.status).toBe(201);
    const v = planVersionView.parse(res.body.data);
    expect(v).toMatchObject({
      number: 1,
      effectiveFrom: TODAY,
      reason: 'Starting plan',
      createdBy: { id: coach.id, name: coach.name },
      acknowledgementCount: 0,
      acknowledgements: [],
      baseline: { usualWaterMl: 2500, usualEnergyKcal: 2100, weightKg: null, sex: 'female' },
    });
    expect(v.changes.length).toBeGreaterThan(0);
    const [row] = await t.dataSource.query(
      'SELECT number, effective_from::text AS d, created_by_id FROM plan_versions',
    );
    expect(row).toEqual({ number: 1, d: TODAY, created_by_id: coach.id });

    const plan = planView.parse((await coachAgent.get(`${base}/plan`)).body.data);
    expect(plan.versions.map((s) => s.number)).toEqual([1]);
    expect(plan.current?.id).toBe(v.id);
    expect(plan.latest?.id).toBe(v.id);

    const one = await coachAgent.get(`${base}/plan/versions/${v.id}`);
    expect(one.status).toBe(200);
    expect(planVersionView.parse(one.body.data)).toEqual(v);
  });

  it('numbers versions 1, 2, 3 and lists what changed, newest first', async () => {
    await create(versionBody(TODAY));
    const second = await create(
      versionBody(
        '2026-12-03',
        planContent({ rest: { energy: { kind: 'kcal', kcal: 1900 }, sodiumMg: 2000 } }),
        {
          reason: 'Less sodium on rest days',
        },
      ),
    );
    expect(second.status).toBe(201);
    const third = await create(versionBody('2026-12-02', planContent(), { reason: 'Back to the start' }));
    expect(third.status).toBe(201);
    const plan = planView.parse((await coachAgent.get(`${base}/plan`)).body.data);
    expect(plan.versions.map((s) => [s.number, s.effectiveFrom])).toEqual([
      [3, '2026-12-02'],
      [2, '2026-12-03'],
      [1, TODAY],
    ]);
    const v2 = plan.versions.find((s) => s.number === 2)!;
    expect(v2.changes.join(' ')).toMatch(/sodium/i);
    // The newest version starts before version 2, so it is in force only on 2 December.
    expect(plan.latest?.number).toBe(3);
    expect(plan.current?.number).toBe(1);
  });

  it('gives concurrent saves consecutive numbers (the athlete row is locked)', async () => {
    const results = await Promise.all([1, 2, 3].map(() => create(versionBody(TODAY))));
    expect(results.map((r) => r.status)).toEqual([201, 201, 201]);
    expect(results.map((r) => r.body.data.number as number).sort()).toEqual([1, 2, 3]);
  });

  it('refuses an effectiveFrom before the athlete’s today, naming the field, and saves nothing', async () => {
    const res = await create(versionBody('2026-11-30'));
    expect(res.status).toBe(400);
    expect(res.body.error.code).toBe('validation_failed');
    expect(Object.keys(res.body.error.fields)).toEqual(['effectiveFrom']);
    expect(res.body.error.fields.effectiveFrom).toContain(TODAY);
    expect(await countPlanRows(t.dataSource, 'plan_versions')).toBe(0);
  });

  it('refuses shares that do not add up to 100 % (±1), naming the fields, and saves nothing', async () => {
    const content = planContent({
      training: {
        energy: { kind: 'kcal', kcal: 2000 },
        protein: { kind: 'pct', pct: 30 },
        carbohydrate: { kind: 'pct', pct: 45 },
        fat: { kind: 'pct', pct: 20 },
      },
    });
    const before = await planRows(t.dataSource);
    const res = await create(versionBody(TODAY, content));
    expect(res.status).toBe(400);
    expect(res.body.error.code).toBe('validation_failed');
    expect(Object.keys(res.body.error.fields).sort()).toEqual([
      'content.dayTypes.0.targets.carbohydrate',
      'content.dayTypes.0.targets.fat',
      'content.dayTypes.0.targets.protein',
    ]);
    expect(res.body.error.fields['content.dayTypes.0.targets.fat']).toMatch(/95 %/);
    expect(await planRows(t.dataSource)).toEqual(before);

    // 30/45/25 adds up (REFERENCES.md §1 check 1: 2400 kcal → 180 g P, 270 g C, 66.67 g F).
    const fine = planContent({
      training: {
        energy: { kind: 'kcal', kcal: 2400 },
        protein: { kind: 'pct', pct: 30 },
        carbohydrate: { kind: 'pct', pct: 45 },
        fat: { kind: 'pct', pct: 25 },
      },
    });
    const ok = await create(versionBody(TODAY, fine));
    expect(ok.status).toBe(201);
    const targets = (await day(TODAY)).targets!.targets;
    expect(targets.proteinG).toBeCloseTo(180, 9);
    expect(targets.carbohydrateG).toBeCloseTo(270, 9);
    expect(targets.fatG).toBeCloseTo(66.6667, 4);
  });

  it('refuses a split with a blank macro on the blank field, and grams beyond the day’s energy', async () => {
    // 60 % P + 60 % C + blank fat: a split needs all three macros (validate.ts).
    const split = planContent({
      training: {
        energy: { kind: 'kcal', kcal: 2000 },
        protein: { kind: 'pct', pct: 60 },
        carbohydrate: { kind: 'pct', pct: 60 },
        fat: null,
      },
    });
    const before = await planRows(t.dataSource);
    const res = await create(versionBody(TODAY, split));
    expect(res.status).toBe(400);
    expect(res.body.error.code).toBe('validation_failed');
    expect(res.body.error.fields['content.dayTypes.0.targets.fat']).toBe(
      'A split in % needs all three macros; set fat too (%, g or g/kg)',
    );
    expect(res.body.error.fields['content.dayTypes.0.targets.protein']).toMatch(/already add up to 120 %/);

    // 200 g P + 400 g C, fat blank: 2,400 kcal (Atwater 4/4, FAO 2003 FNP 77) is 160 % of 1,500 kcal.
    const grams = planContent({
      training: {
        energy: { kind: 'kcal', kcal: 1500 },
        protein: { kind: 'g', g: 200 },
        carbohydrate: { kind: 'g', g: 400 },
        fat: null,
      },
    });
    const over = await create(versionBody(TODAY, grams));
    expect(over.status).toBe(400);
    expect(Object.keys(over.body.error.fields).sort()).toEqual([
      'content.dayTypes.0.targets.carbohydrate',
      'content.dayTypes.0.targets.protein',
    ]);
    expect(over.body.error.fields['content.dayTypes.0.targets.protein']).toMatch(
      /2,400 kcal, 160 % of the 1,500 kcal/,
    );
    expect(await planRows(t.dataSource)).toEqual(before);
  });

  it('refuses a zod-invalid content with the field path', async () => {
    const content = planContent({ training: { sodiumMg: -5 } });
    const res = await create(versionBody(TODAY, content));
    expect(res.status).toBe(400);
    expect(Object.keys(res.body.error.fields)).toEqual(['content.dayTypes.0.targets.sodiumMg']);
  });
});

describe('planned-loss guardrail over any 7 consecutive planned days', () => {
  // Helms 2014 (JISSN 11:20): > 1 %/week warns; 7,700 kcal per kg lost: common practice, no source.
  it('60 dated days at 1,300 kcal (usual 2,100) at 60 kg raise loss_rate, though the weekly pattern alone does not', async () => {
    const athlete = await signedIn(t.app, me.user.email, FACTORY_PASSWORD);
    await athlete.put(`${base}/days/2026-11-30/weigh-in`).send(weighInBody({ weight: 60 }));
    // 4·100 + 4·135 + 9·40 = 1,300 kcal.
    const low = safeTargets({
      energy: { kind: 'kcal', kcal: 1300 },
      protein: { kind: 'g', g: 100 },
      carbohydrate: { kind: 'g', g: 135 },
      fat: { kind: 'g', g: 40 },
    });
    const date = (i: number) => new Date(Date.UTC(2026, 11, 1 + i)).toISOString().slice(0, 10);
    const dates = Array.from({ length: 60 }, (_, i) => ({
      date: date(i),
      label: null,
      countdownOffset: null,
      targets: low,
    }));
    // The pattern alone: (6·2,000 + 1,900)/7 = 1,986 kcal, 114 kcal below usual → no warning.
    expect((await create(versionBody(TODAY, planContent()))).status).toBe(201);

    const res = await create(versionBody(TODAY, planContent({ dates })));
    expect(res.status).toBe(409);
    expect(Object.keys(res.body.error.fields)).toEqual(['loss_rate:plan']);
    // 800 kcal/d · 7 / 7,700 = 0.73 kg a week = 1.2 % of 60 kg.
    expect(res.body.error.fields['loss_rate:plan']).toContain(
      'The 7 planned days from Tue 1 Dec to Mon 7 Dec average 1,300 kcal a day, 800 kcal below the usual ' +
        '2,100 kcal: about 0.73 kg a week, 1.2 % of body weight (60.0 kg) a week',
    );
  });
});

describe('guardrails on save', () => {
  // Sodium 1,200 mg on rest days is below the NASEM (2019) adequate intake of 1,500 mg
  // (doi:10.17226/25353); a diuretic-type item is a strong warning (Sturmi 1995; Mayr 2012; Cheung 2014).
  const risky = () =>
    planContent({
      rest: { sodiumMg: 1200 },
      dates: [
        {
          date: '2026-12-04',
          label: 'Photo check',
          countdownOffset: null,
          targets: planContent().dayTypes[0]!.targets,
        },
      ],
      training: { supplements: [supplement('Dandelion root extract')] },
    });

  it('answers 409 guardrails_unacknowledged listing each warning by key, and saves nothing', async () => {
    const before = await planRows(t.dataSource);
    const res = await create(versionBody(TODAY, risky()));
    expect(res.status).toBe(409);
    expect(res.body.error.code).toBe('guardrails_unacknowledged');
    expect(Object.keys(res.body.error.fields).sort()).toEqual([
      'diuretic:type:training',
      'sodium_low:type:rest',
    ]);
    expect(res.body.error.fields['sodium_low:type:rest']).toMatch(/1,200 mg/);
    // The same warnings whole, as the server judged them: the web renders these, it does not guess.
    const judged = guardrailWarning.array().parse(res.body.error.warnings);
    expect(judged.map((w) => [w.key, w.code, w.severity, w.scope]).sort()).toEqual([
      ['diuretic:type:training', 'diuretic', 'strong', { kind: 'day_type', key: 'training' }],
      ['sodium_low:type:rest', 'sodium_low', 'warning', { kind: 'day_type', key: 'rest' }],
    ]);
    expect(judged.find((w) => w.code === 'sodium_low')!.source).toMatch(/NASEM/);
    expect(judged.find((w) => w.code === 'diuretic')!.source).not.toBe('');
    for (const w of judged) expect(res.body.error.fields[w.key]).toBe(w.message);
    expect(await planRows(t.dataSource)).toEqual(before);

    // One acknowledged, one not: still refused, naming only the missing one.
    const partly = await create(versionBody(TODAY, risky(), { acknowledgedKeys: ['sodium_low:type:rest'] }));
    expect(partly.status).toBe(409);
    expect(Object.keys(partly.body.error.fields)).toEqual(['diuretic:type:training']);
    expect(partly.body.error.warnings.map((w: GuardrailWarning) => w.key)).toEqual([
      'diuretic:type:training',
    ]);
    expect(await planRows(t.dataSource)).toEqual(before);
  });

  it('stores every acknowledgement with who and when; the athlete sees the caution on the days it covers', async () => {
    const check = await coachAgent
      .post(`${base}/plan/check`)
      .send({ effectiveFrom: TODAY, content: risky() });
    expect(check.status).toBe(200);
    expect(check.body.data.errors).toEqual({});
    const warnings = check.body.data.warnings as GuardrailWarning[];
    const keys = warnings.map((w) => w.key).sort();
    expect(keys).toEqual(['diuretic:type:training', 'sodium_low:type:rest']);
    expect(warnings.find((w) => w.code === 'sodium_low')!.source).toMatch(/NASEM/);
    expect(await countPlanRows(t.dataSource, 'plan_versions')).toBe(0);

    const res = await create(versionBody(TODAY, risky(), { acknowledgedKeys: keys }));
    expect(res.status).toBe(201);
    const v = planVersionView.parse(res.body.data);
    expect(v.acknowledgementCount).toBe(2);
    expect(v.acknowledgements.map((a) => a.key).sort()).toEqual(keys);
    for (const a of v.acknowledgements) {
      expect(a.by).toEqual({ id: coach.id, name: coach.name });
      expect(a.at).toBe(v.createdAt);
    }
    const rows = await t.dataSource.query(
      'SELECT key, severity, acknowledged_by_id, acknowledged_at FROM guardrail_acknowledgements ORDER BY key',
    );
    expect(rows.map((r: { key: string }) => r.key)).toEqual(keys);
    expect(rows.every((r: { acknowledged_by_id: string }) => r.acknowledged_by_id === coach.id)).toBe(true);
    expect(rows.find((r: { key: string }) => r.key === 'diuretic:type:training').severity).toBe('strong');

    const athlete = await signedIn(t.app, me.user.email, FACTORY_PASSWORD);
    // Sunday 6 December follows the rest day type: its sodium caution, not the training one.
    const sunday = await dayAs(athlete, '2026-12-06');
    expect(sunday.targets?.source).toEqual({ kind: 'pattern', dayTypeKey: 'rest', dayTypeName: 'Rest day' });
    expect(sunday.cautions.map((c) => c.code)).toEqual(['sodium_low']);
    expect(sunday.cautions[0]!.acknowledgedAt).toBe(v.createdAt);
    // Tuesday (training): the diuretic caution.
    const tuesday = await dayAs(athlete, TODAY);
    expect(tuesday.cautions.map((c) => [c.code, c.severity])).toEqual([['diuretic', 'strong']]);
    // The dated day (Friday 4 December) follows neither type: no caution from the day types.
    const friday = await dayAs(athlete, '2026-12-04');
    expect(friday.targets?.source).toEqual({ kind: 'date', label: 'Photo check' });
    expect(friday.cautions).toEqual([]);
  });

  it('judges floors set by the owner; a coach may read them but not change them', async () => {
    const floors = await coachAgent.get('/api/team/guardrails');
    expect(floors.status).toBe(200);
    expect(floors.body).toEqual({ data: GUARDRAIL_DEFAULTS, abilities: { manage: false } });
    const raised = { energyKcal: { female: 2050, male: 2200 }, waterMl: { female: 1600, male: 2000 } };
    expect((await coachAgent.put('/api/team/guardrails').send(raised)).status).toBe(403);

    const head = await signedIn(t.app, owner.email, FACTORY_PASSWORD);
    const put = await head.put('/api/team/guardrails').send(raised);
    expect(put.status).toBe(200);
    expect(put.body.data).toEqual(raised);
    const bad = await head
      .put('/api/team/guardrails')
      .send({ ...raised, waterMl: { female: -1, male: 2000 } });
    expect(bad.status).toBe(400);
    expect(Object.keys(bad.body.error.fields)).toEqual(['waterMl.female']);

    // 2,000 and 1,900 kcal are now below the women's floor of 2,050 kcal.
    const res = await create(versionBody(TODAY));
    expect(res.status).toBe(409);
    expect(Object.keys(res.body.error.fields).sort()).toEqual([
      'energy_floor:type:rest',
      'energy_floor:type:training',
    ]);
    expect((await coachAgent.get(`${base}/plan`)).body.data.floors).toEqual(raised);
  });
});

describe('the day view judged by the version in force', () => {
  it('switches at each version’s first day; ties go to the higher number; before the first, none', async () => {
    await create(versionBody(TODAY));
    const later = planContent({
      training: { energy: { kind: 'kcal', kcal: 2200 }, carbohydrate: { kind: 'g', g: 265 } },
    });
    await create(versionBody('2026-12-03', later, { reason: 'More food from Thursday' }));
    const tie = planContent({
      training: { energy: { kind: 'kcal', kcal: 2100 }, carbohydrate: { kind: 'g', g: 240 } },
    });
    await create(versionBody('2026-12-03', tie, { reason: 'Second thoughts' }));

    expect((await day('2026-11-30')).targets).toBeNull();
    const first = await day(TODAY);
    expect(first.targets).toMatchObject({ versionNumber: 1, effectiveFrom: TODAY });
    expect(first.targets!.targets.energyKcal).toBe(2000);
    expect(first.targets!.tolerances).toEqual({
      energyPct: 5,
      proteinG: 10,
      carbohydrateG: 15,
      fatG: 7,
      waterPct: 10,
      sodiumPct: 15,
      // Steps and cardio: 10 % short still on plan (common practice, no source).
      activityPct: 10,
    });
    expect((await day('2026-12-02')).targets!.versionNumber).toBe(1);
    const third = await day('2026-12-03');
    expect(third.targets).toMatchObject({ versionNumber: 3, effectiveFrom: '2026-12-03' });
    expect(third.targets!.targets.energyKcal).toBe(2100);
  });

  it('keeps a past day on the plan it had, resolved with that version’s own baseline', async () => {
    // Water relative to usual: 2500 mL + 500 mL (common practice, no source) = 3000 mL today.
    const relative = planContent({ training: { water: { kind: 'usual_plus', ml: 500 } } });
    expect((await create(versionBody(TODAY, relative))).status).toBe(201);
    expect((await day(TODAY)).targets!.targets.waterMl).toBe(3000);

    // Two days later the athlete's usual water is 4000 mL and a new version starts.
    now = new Date('2026-12-03T10:00:00Z');
    await t.dataSource.getRepository(Athlete).update(me.athlete.id, { usualWaterMl: 4000 });
    expect(
      (await create(versionBody('2026-12-03', relative, { reason: 'Usual water went up' }))).status,
    ).toBe(201);
    const past = await day(TODAY);
    expect(past.targets).toMatchObject({ versionNumber: 1 });
    expect(past.targets!.targets.waterMl).toBe(3000);
    expect(past.targets!.targets.basis.water).toMatch(/2,500 mL/);
    expect((await day('2026-12-03')).targets!.targets.waterMl).toBe(4500);

    // A past-dated version is refused now (past days keep their plan).
    const refused = await create(versionBody(TODAY, planContent({ training: { sodiumMg: 3000 } })));
    expect(refused.status).toBe(400);
    expect((await day(TODAY)).targets!.targets.waterMl).toBe(3000);
  });

  it('shows history the seed writes directly through the repository', async () => {
    const plans = new PlanRepository(t.dataSource.manager);
    const createdAt = new Date('2026-10-01T09:00:00Z');
    const warning: GuardrailWarning = {
      key: 'sodium_low:type:rest',
      code: 'sodium_low',
      severity: 'warning',
      scope: { kind: 'day_type', key: 'rest' },
      message: 'Rest day: sodium 1,200 mg is below the adequate intake of 1,500 mg a day.',
      source: 'NASEM (2019)',
      field: 'dayTypes.1.targets.sodiumMg',
    };
    const v = await plans.insertVersion({
      athleteId: me.athlete.id,
      effectiveFrom: '2026-10-01',
      reason: 'Seeded history',
      content: planContent({ rest: { sodiumMg: 1200 } }),
      baseline: { usualWaterMl: 2400, usualEnergyKcal: 2000, weightKg: 70, sex: 'female' },
      createdById: coach.id,
      createdAt,
      acknowledgements: [warning],
    });
    expect(v.number).toBe(1);
    const [ack] = await t.dataSource.query(
      'SELECT acknowledged_by_id, acknowledged_at FROM guardrail_acknowledgements WHERE plan_version_id = $1',
      [v.id],
    );
    expect(ack.acknowledged_by_id).toBe(coach.id);
    expect(new Date(ack.acknowledged_at).toISOString()).toBe(createdAt.toISOString());
    // Sunday 4 October 2026 is a rest day of that version.
    const sunday = await day('2026-10-04');
    expect(sunday.targets).toMatchObject({ versionNumber: 1, effectiveFrom: '2026-10-01' });
    expect(sunday.cautions).toEqual([
      {
        code: 'sodium_low',
        severity: 'warning',
        message: warning.message,
        source: 'NASEM (2019)',
        acknowledgedAt: createdAt.toISOString(),
      },
    ]);
    expect((await create(versionBody(TODAY))).body.data.number).toBe(2);
  });
});

describe('an athlete in Pacific/Auckland (UTC+13 in December)', () => {
  it('counts today from the athlete’s own date, not the server’s', async () => {
    // 11:30 UTC on 1 December is 00:30 on 2 December in Auckland.
    now = new Date('2026-12-01T11:30:00Z');
    const kiwi = await createAthlete(t.dataSource, { coach, user: { timeZone: 'Pacific/Auckland' } });
    const kiwiBase = `/api/athletes/${kiwi.athlete.id}`;
    const yesterday = await coachAgent.post(`${kiwiBase}/plan/versions`).send(versionBody('2026-12-01'));
    expect(yesterday.status).toBe(400);
    expect(Object.keys(yesterday.body.error.fields)).toEqual(['effectiveFrom']);
    const today = await coachAgent.post(`${kiwiBase}/plan/versions`).send(versionBody('2026-12-02'));
    expect(today.status).toBe(201);
    expect((await coachAgent.get(`${kiwiBase}/plan`)).body.data.today).toBe('2026-12-02');
    expect((await coachAgent.get(`${kiwiBase}/days/2026-12-01`)).body.data.targets).toBeNull();
    const d = (await coachAgent.get(`${kiwiBase}/days/2026-12-02`)).body.data;
    expect(d.targets.versionNumber).toBe(1);
    expect(d.isToday).toBe(true);

    // The same request for the Madrid athlete (still 1 December there) is accepted.
    expect((await create(versionBody('2026-12-01'))).status).toBe(201);
  });
});

describe('reading a version', () => {
  it('answers 404 for another athlete’s version id', async () => {
    const other = await createAthlete(t.dataSource, { coach });
    const theirs = await coachAgent
      .post(`/api/athletes/${other.athlete.id}/plan/versions`)
      .send(versionBody(TODAY));
    expect(theirs.status).toBe(201);
    expect((await coachAgent.get(`${base}/plan/versions/${theirs.body.data.id}`)).status).toBe(404);
    expect((await coachAgent.get(`${base}/plan/versions/not-a-uuid`)).status).toBe(404);
  });
});

describe('PATCH event', () => {
  it('changes the event and offers no countdown move without a countdown', async () => {
    await createAcknowledged(versionBody(TODAY));
    const res = await coachAgent
      .patch(`${base}/event`)
      .send({ eventDate: '2027-05-01', eventTime: '10:30', eventName: 'Spring Classic' });
    expect(res.status).toBe(200);
    expect(res.body.data.athlete).toMatchObject({
      eventDate: '2027-05-01',
      eventTime: '10:30',
      eventName: 'Spring Classic',
    });
    expect(res.body.data.athlete.countdownMismatch).toBeNull();
    const bad = await coachAgent.patch(`${base}/event`).send({ eventDate: '2027-02-30' });
    expect(bad.status).toBe(400);
    expect(Object.keys(bad.body.error.fields)).toEqual(['eventDate']);
  });
});
