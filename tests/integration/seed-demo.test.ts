import { mkdtempSync, readdirSync, rmSync } from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import bcrypt from 'bcryptjs';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { LocalFolderStorage } from '../../api/src/adapters/storage.js';
import { Athlete } from '../../api/src/entities/athlete.entity.js';
import { AthleteFlag } from '../../api/src/entities/athlete-flag.entity.js';
import { ConditionPhoto } from '../../api/src/entities/condition-photo.entity.js';
import { EveningLog } from '../../api/src/entities/evening-log.entity.js';
import { FluidEntry } from '../../api/src/entities/fluid-entry.entity.js';
import { MealEntry } from '../../api/src/entities/meal-entry.entity.js';
import { SupplementEntry } from '../../api/src/entities/supplement-entry.entity.js';
import { SymptomReport } from '../../api/src/entities/symptom-report.entity.js';
import { WeighIn } from '../../api/src/entities/weigh-in.entity.js';
import { AthleteShare } from '../../api/src/entities/athlete-share.entity.js';
import { CountdownTemplate } from '../../api/src/entities/countdown-template.entity.js';
import { GuardrailAcknowledgement } from '../../api/src/entities/guardrail-acknowledgement.entity.js';
import { Mark } from '../../api/src/entities/mark.entity.js';
import { MarkRead } from '../../api/src/entities/mark-read.entity.js';
import { MarkReply } from '../../api/src/entities/mark-reply.entity.js';
import { MarkRepository } from '../../api/src/repositories/mark.repository.js';
import { PlanVersion } from '../../api/src/entities/plan-version.entity.js';
import { Consent } from '../../api/src/entities/consent.entity.js';
import { Invitation } from '../../api/src/entities/invitation.entity.js';
import { OutboxMessage } from '../../api/src/entities/outbox-message.entity.js';
import { Team } from '../../api/src/entities/team.entity.js';
import { User } from '../../api/src/entities/user.entity.js';
import { GUARDRAIL_DEFAULTS } from '@driftmark/shared';
import { addDays, localDate } from '../../api/src/seed/calendar.js';
import { DEMO_TEMPLATES, planDemoVersions } from '../../api/src/seed/demo-plans.js';
import { DEMO_ATHLETES, DEMO_PASSWORD, DEMO_STAFF, DEMO_TEAM_NAME } from '../../api/src/seed/demo-team.js';
import { seedDemo, SeedRefusedError } from '../../api/src/seed/seed-demo.js';
import { planDemoHistory } from '../../api/src/seed/seed-history.js';
import { planDemoMarks } from '../../api/src/seed/seed-marks.js';
import { buildTestApp, signedIn, type TestApp } from './setup/app.js';
import { DEMO_BODY_MEASUREMENTS } from '../../api/src/seed/seed-body-composition.js';

let t: TestApp;
const seededAt = new Date('2026-12-01T11:30:00Z');
// Photos go to a folder of this file's own; the app reads the same folder.
const uploadsDir = mkdtempSync(path.join(os.tmpdir(), 'driftmark-seed-'));
const storage = new LocalFolderStorage(uploadsDir);
const seed = (options: { appMode?: string; now?: Date } = {}) =>
  seedDemo(t.dataSource, { storage, ...options });
/** What the generators produce for the seed date, to compare the database with. */
const plans = planDemoHistory(DEMO_ATHLETES, seededAt);
/** The plan versions the seed writes (template ids do not change what is counted). */
const planVersions = plans.flatMap(({ def, history }) =>
  planDemoVersions({
    def,
    history,
    now: seededAt,
    floors: GUARDRAIL_DEFAULTS,
    templates: new Map(
      DEMO_TEMPLATES.map((t) => [t.key, { id: '00000000-0000-4000-8000-000000000001', ...t }]),
    ),
  }),
);

function storedFiles(): number {
  return readdirSync(uploadsDir, { recursive: true, withFileTypes: true }).filter((e) => e.isFile()).length;
}

async function counts() {
  const db = t.dataSource;
  return {
    teams: await db.getRepository(Team).count(),
    users: await db.getRepository(User).count(),
    athletes: await db.getRepository(Athlete).count(),
    consents: await db.getRepository(Consent).count(),
    shares: await db.getRepository(AthleteShare).count(),
    invitations: await db.getRepository(Invitation).count(),
    outbox: await db.getRepository(OutboxMessage).count(),
    weighIns: await db.getRepository(WeighIn).count(),
    fluids: await db.getRepository(FluidEntry).count(),
    meals: await db.getRepository(MealEntry).count(),
    supplements: await db.getRepository(SupplementEntry).count(),
    evenings: await db.getRepository(EveningLog).count(),
    symptoms: await db.getRepository(SymptomReport).count(),
    flags: await db.getRepository(AthleteFlag).count(),
    photos: await db.getRepository(ConditionPhoto).count(),
    files: storedFiles(),
    templates: await db.getRepository(CountdownTemplate).count(),
    planVersions: await db.getRepository(PlanVersion).count(),
    acknowledgements: await db.getRepository(GuardrailAcknowledgement).count(),
    marks: await db.getRepository(Mark).count(),
    markReplies: await db.getRepository(MarkReply).count(),
    markReads: await db.getRepository(MarkRead).count(),
  };
}

const demoMarks = planDemoMarks(plans);

const sum = (f: (d: (typeof plans)[number]['history']['days'][number]) => number) =>
  plans.reduce((a, p) => a + p.history.days.reduce((b, d) => b + f(d), 0), 0);

beforeAll(async () => {
  t = await buildTestApp({ uploadsDir }, { clock: () => seededAt });
  await t.reset();
});
afterAll(async () => {
  await t?.reset();
  await t?.close();
  rmSync(uploadsDir, { recursive: true, force: true });
});

describe('seedDemo', () => {
  it('refuses in production and writes nothing', async () => {
    await expect(seed({ appMode: 'production' })).rejects.toBeInstanceOf(SeedRefusedError);
    const previous = process.env.APP_MODE;
    process.env.APP_MODE = 'production';
    try {
      await expect(seed()).rejects.toThrow(/refused in production/);
    } finally {
      if (previous === undefined) delete process.env.APP_MODE;
      else process.env.APP_MODE = previous;
    }
    expect((await counts()).users).toBe(0);
    expect(storedFiles()).toBe(0);
  });

  it('creates the team once, even when run twice (and twice at once)', async () => {
    const [a, b] = await Promise.all([
      seed({ appMode: 'test', now: seededAt }),
      seed({ appMode: 'test', now: seededAt }),
    ]);
    expect([a.created, b.created].sort()).toEqual([false, true]);
    const first = await counts();
    expect(first).toEqual({
      teams: 1,
      users: 8,
      athletes: 6,
      consents: 12,
      shares: 2,
      invitations: 0,
      outbox: 0,
      // Exactly what the generators planned: nothing invented on a missed day, nothing twice.
      weighIns: sum((d) => (d.weighIn ? 1 : 0)),
      fluids: sum((d) => d.fluids.length),
      meals: sum((d) => d.meals.length),
      supplements: sum((d) => d.supplements.length),
      evenings: sum((d) => (d.evening ? 1 : 0)),
      symptoms: sum((d) => d.symptoms.length),
      flags: 1,
      photos: plans.reduce((a, p) => a + p.photos.length, 0),
      // Two stored sizes per photo.
      files: 2 * plans.reduce((a, p) => a + p.photos.length, 0),
      templates: 3,
      planVersions: planVersions.length,
      acknowledgements: planVersions.reduce((a, v) => a + v.acknowledgements.length, 0),
      marks: demoMarks.length,
      markReplies: demoMarks.filter((m) => m.reply).length,
      // The author's read, and the athlete's when they replied or read.
      markReads: demoMarks.reduce((a, m) => a + 1 + (m.reply || m.athleteReadAt ? 1 : 0), 0),
    });
    expect(first.marks).toBeGreaterThanOrEqual(5);
    expect(first.acknowledgements).toBeGreaterThan(0);
    expect(first.weighIns).toBeGreaterThan(500);
    expect(first.photos).toBeGreaterThan(100);

    // The same day: nothing to create and no dates to move (demo-date-refresh.test.ts moves them).
    expect(await seed({ appMode: 'test', now: seededAt })).toEqual({ created: false, movedDays: 0 });
    expect(await counts()).toEqual(first);
  });

  it('gives each athlete about four months of history ending yesterday, the skipper far fewer days', async () => {
    const rows = await t.dataSource.query<{ email: string; n: number; first: string; last: string }[]>(
      `SELECT u.email, COUNT(w.id)::int AS n, to_char(MIN(w.local_date), 'YYYY-MM-DD') AS first,
              to_char(MAX(w.local_date), 'YYYY-MM-DD') AS last
         FROM athletes a JOIN users u ON u.id = a.user_id LEFT JOIN weigh_ins w ON w.athlete_id = a.id
        GROUP BY u.email`,
    );
    const byEmail = new Map(rows.map((r) => [r.email, r]));
    const skipper = byEmail.get('leilani.akana@driftmark.test')!;
    for (const def of DEMO_ATHLETES) {
      const row = byEmail.get(def.email)!;
      const today = localDate(seededAt, def.timeZone);
      // Nothing on or after the athlete's own seed date; the first weigh-ins about four months back.
      expect(row.last <= addDays(today, -1), def.email).toBe(true);
      expect(row.first <= addDays(today, -100), def.email).toBe(true);
      if (def.key !== 'skips_check_ins') {
        expect(row.n, def.email).toBeGreaterThan(90);
        expect(skipper.n).toBeLessThan(row.n * 0.6);
      }
    }
    expect(skipper.n).toBeGreaterThan(25);
    // No entry of any kind on or after the athlete's own seed date.
    const latest = await t.dataSource.query<{ email: string; last: string }[]>(
      `SELECT u.email, to_char(MAX(d.local_date), 'YYYY-MM-DD') AS last
         FROM (SELECT athlete_id, local_date FROM weigh_ins
               UNION ALL SELECT athlete_id, local_date FROM fluid_entries
               UNION ALL SELECT athlete_id, local_date FROM meal_entries
               UNION ALL SELECT athlete_id, local_date FROM supplement_entries
               UNION ALL SELECT athlete_id, local_date FROM evening_logs
               UNION ALL SELECT athlete_id, local_date FROM symptom_reports
               UNION ALL SELECT athlete_id, local_date FROM condition_photos) d
         JOIN athletes a ON a.id = d.athlete_id JOIN users u ON u.id = a.user_id
        GROUP BY u.email`,
    );
    expect(latest).toHaveLength(DEMO_ATHLETES.length);
    for (const row of latest) {
      const def = DEMO_ATHLETES.find((d) => d.email === row.email)!;
      expect(row.last <= addDays(localDate(seededAt, def.timeZone), -1), row.email).toBe(true);
    }
  });

  it('serves a seeded day through the API, with the countdown athlete’s flag and photos', async () => {
    const coach = await signedIn(t.app, 'coach@driftmark.test', DEMO_PASSWORD);
    const athlete = await t.dataSource
      .getRepository(Athlete)
      .findOneOrFail({ where: { user: { email: 'athlete@driftmark.test' } }, relations: { user: true } });
    const plan = plans.find((p) => p.def.key === 'final_week')!;
    // Two days before the seed: the dizziness report.
    const dizzyDay = plan.history.days.find((d) => d.daysBeforeSeed === 2)!;
    const res = await coach.get(`/api/athletes/${athlete.id}/days/${dizzyDay.date}`);
    expect(res.status).toBe(200);
    const day = res.body.data;
    expect(day.date).toBe(dizzyDay.date);
    expect(day.weighIn?.weightKg).toBe(dizzyDay.weighIn?.weightKg);
    expect(day.fluids).toHaveLength(dizzyDay.fluids.length);
    expect(day.fluidTotalMl).toBeCloseTo(
      dizzyDay.fluids.reduce((a, f) => a + f.volumeMl, 0),
      6,
    );
    expect(day.meals).toHaveLength(dizzyDay.meals.length);
    expect(day.totals.energyKcal).toBeCloseTo(
      dizzyDay.meals.reduce((a, m) => a + m.energyKcal, 0),
      6,
    );
    expect(day.symptoms).toEqual([expect.objectContaining({ symptoms: ['dizziness'], urgent: true })]);
    expect(day.flags).toEqual([
      expect.objectContaining({ kind: 'symptom', message: expect.stringMatching(/Dizziness/) }),
    ]);
    expect(day.evening?.note).toMatch(/dizzy/i);

    // A photo day: three relaxed poses, each size served from storage.
    const photoDay = plan.photos[0]!.date;
    const photos = await coach.get(`/api/athletes/${athlete.id}/photos?from=${photoDay}&to=${photoDay}`);
    expect(photos.status).toBe(200);
    expect(photos.body.data.map((p: { pose: string }) => p.pose).sort()).toEqual([
      'Back relaxed',
      'Front relaxed',
      'Side relaxed',
    ]);
    for (const size of ['thumb', 'display'] as const) {
      const file = await coach.get(photos.body.data[0].urls[size]);
      expect(file.status).toBe(200);
      expect(file.headers['content-type']).toMatch(/^image\/jpeg/);
    }
    const all = await coach.get(`/api/athletes/${athlete.id}/photos`);
    expect(all.body.data).toHaveLength(plan.photos.length);

    // The history list has one row per logged day.
    const today = localDate(seededAt, 'Europe/Madrid');
    const list = await coach.get(`/api/athletes/${athlete.id}/days?from=${addDays(today, -130)}&to=${today}`);
    expect(list.status).toBe(200);
    expect(list.body.data).toHaveLength(plan.history.days.filter((d) => !d.missed).length);
  });

  it('gives every athlete a plan with history, and the countdown athlete today’s countdown day', async () => {
    const coach = await signedIn(t.app, 'coach@driftmark.test', DEMO_PASSWORD);
    const athletes = await t.dataSource.getRepository(Athlete).find({ relations: { user: true } });
    for (const athlete of athletes) {
      const res = await coach.get(`/api/athletes/${athlete.id}/plan`);
      expect(res.status, athlete.user!.email).toBe(200);
      expect(res.body.data.versions.length, athlete.user!.email).toBeGreaterThanOrEqual(2);
      expect(res.body.data.current, athlete.user!.email).not.toBeNull();
    }
    const templates = await coach.get('/api/countdown-templates');
    expect(templates.status).toBe(200);
    expect(templates.body.data.map((x: { eventType: string }) => x.eventType).sort()).toEqual([
      'shoot',
      'show',
      'weigh_in',
    ]);

    const agent = await signedIn(t.app, 'athlete@driftmark.test', DEMO_PASSWORD);
    const me = await agent.get('/api/me');
    const today = localDate(seededAt, 'Europe/Madrid');
    const res = await agent.get(`/api/athletes/${me.body.data.athleteId}/days/${today}`);
    expect(res.status).toBe(200);
    const day = res.body.data;
    expect(day.countdown).toMatchObject({
      eventDate: '2026-12-05',
      offset: -4,
      dayLabel: 'E-4',
      label: 'Steady',
    });
    expect(day.targets.source).toEqual({ kind: 'date', label: 'Steady' });
    // 0.85 × the usual 2,600 kcal.
    expect(day.targets.targets.energyKcal).toBeCloseTo(2210, 6);
    expect(day.cautions[0]).toMatchObject({ code: 'countdown', severity: 'strong' });
    expect(day.cautions[0].message).toMatch(/^E-4 of your countdown/);
    // E-3 adds the carbohydrate-load warning the coach acknowledged.
    const e3 = await agent.get(`/api/athletes/${me.body.data.athleteId}/days/2026-12-02`);
    expect(e3.body.data.cautions.map((c: { code: string }) => c.code)).toEqual(['countdown', 'carb_load']);
    expect(e3.body.data.cautions[1].acknowledgedAt).not.toBeNull();
  });

  it("gives Hannah's coach her skinfolds placed before the seed day, each with % fat and lean mass", async () => {
    const def = DEMO_ATHLETES.find((d) => d.key === 'long_diet')!;
    const coach = await signedIn(t.app, 'coach@driftmark.test', DEMO_PASSWORD);
    const [athlete] = await t.dataSource.query<{ id: string }[]>(
      'SELECT a.id FROM athletes a JOIN users u ON u.id = a.user_id WHERE u.email = $1',
      [def.email],
    );
    const res = await coach.get(`/api/athletes/${athlete!.id}/body-composition`);
    expect(res.status).toBe(200);
    const today = localDate(seededAt, def.timeZone);
    const placed = DEMO_BODY_MEASUREMENTS.long_diet!;
    expect(res.body.data.measurements.map((m: { date: string }) => m.date)).toEqual(
      placed.map((m) => addDays(today, -m.daysBeforeSeed)),
    );
    for (const m of res.body.data.measurements) {
      expect(m.estimate.equation).toBe('Jackson, Pollock & Ward 3-site, Siri');
      expect(m.leanMassKg).toBeGreaterThan(0);
    }
    // The sums fall over the diet, and so does the estimate.
    const pcts = res.body.data.measurements.map(
      (m: { estimate: { fatPercent: number } }) => m.estimate.fatPercent,
    );
    expect([...pcts].sort((a, b) => b - a)).toEqual(pcts);
    expect(res.body.data.latestLeanMass.date).toBe(addDays(today, -1));
  });

  it('pins marks on the demo charts: one athlete reply waits for the coach, the countdown athlete has unread marks', async () => {
    const athletes = await t.dataSource.getRepository(Athlete).find({ relations: { user: true } });
    const byEmail = new Map(athletes.map((a) => [a.user!.email, a]));
    const owner = await t.dataSource.getRepository(User).findOneByOrFail({ email: 'coach@driftmark.test' });
    const unread = await new MarkRepository(t.dataSource.manager).unreadRepliesByAthlete(
      owner.id,
      athletes.map((a) => a.id),
    );
    const skipper = byEmail.get('leilani.akana@driftmark.test')!;
    expect([...unread.keys()]).toEqual([skipper.id]);
    expect(unread.get(skipper.id)!.count).toBe(1);
    expect(unread.get(skipper.id)!.latestAt.getTime()).toBeLessThan(seededAt.getTime());

    const coach = await signedIn(t.app, 'coach@driftmark.test', DEMO_PASSWORD);
    const skipperMarks = await coach.get(`/api/athletes/${skipper.id}/marks`);
    expect(skipperMarks.status).toBe(200);
    const [missed] = skipperMarks.body.data;
    expect(missed).toMatchObject({
      metric: 'weight',
      unread: true,
      note: expect.stringMatching(/missed weigh-ins/),
    });
    expect(missed.replies).toHaveLength(1);
    // The marked days really have no weigh-in.
    const plan = plans.find((p) => p.def.email === 'leilani.akana@driftmark.test')!;
    const marked = plan.history.days.filter((d) => d.date >= missed.fromDate && d.date <= missed.toDate);
    expect(marked.length).toBeGreaterThanOrEqual(2);
    expect(marked.every((d) => !d.weighIn)).toBe(true);

    const mateo = await signedIn(t.app, 'athlete@driftmark.test', DEMO_PASSWORD);
    const own = await mateo.get(`/api/athletes/${byEmail.get('athlete@driftmark.test')!.id}/marks`);
    expect(own.status).toBe(200);
    expect(own.body.data.length).toBeGreaterThanOrEqual(2);
    expect(own.body.data[0]).toMatchObject({ author: { role: 'owner' }, metric: 'weight', unread: true });
    const today = localDate(seededAt, 'Europe/Madrid');
    for (const m of own.body.data) expect(m.toDate < today, m.note).toBe(true);

    // The assistant's mark on a shared athlete, read by her.
    const assistant = await signedIn(t.app, 'assistant@driftmark.test', DEMO_PASSWORD);
    const hannah = byEmail.get('hannah.kowalski@driftmark.test')!;
    const shared = await assistant.get(`/api/athletes/${hannah.id}/marks`);
    expect(shared.body.data).toEqual([
      expect.objectContaining({ author: expect.objectContaining({ role: 'assistant' }), unread: false }),
    ]);
    expect(shared.body.data[0].readByOtherAt).not.toBeNull();
  });

  it('keeps the typed units: a lb athlete’s weigh-ins come back in lb', async () => {
    const def = DEMO_ATHLETES.find((d) => d.weightUnit === 'lb' && d.volumeUnit === 'floz')!;
    const plan = plans.find((p) => p.def.key === def.key)!;
    const seeded = plan.history.days.find((d) => d.weighIn && d.fluids.length > 0)!;
    const agent = await signedIn(t.app, def.email, DEMO_PASSWORD);
    const me = await agent.get('/api/me');
    const res = await agent.get(`/api/athletes/${me.body.data.athleteId}/days/${seeded.date}`);
    expect(res.status).toBe(200);
    expect(res.body.data.weighIn.entered).toEqual({ value: seeded.weighIn!.entered.value, unit: 'lb' });
    expect(res.body.data.fluids[0].entered.unit).toBe('floz');
  });

  it('stores the team, roles, completed intakes and event dates relative to the seed date', async () => {
    const team = await t.dataSource.getRepository(Team).findOneByOrFail({ name: DEMO_TEAM_NAME });
    const users = await t.dataSource.getRepository(User).find();
    expect(users.every((u) => u.teamId === team.id)).toBe(true);
    expect(users.filter((u) => u.role === 'owner').map((u) => u.email)).toEqual(['coach@driftmark.test']);
    expect(users.filter((u) => u.role === 'assistant').map((u) => u.email)).toEqual([
      'assistant@driftmark.test',
    ]);
    expect(new Set(users.map((u) => u.timeZone)).size).toBeGreaterThanOrEqual(6);
    expect(users.some((u) => u.weightUnit === 'lb')).toBe(true);
    expect(users.some((u) => u.volumeUnit === 'floz')).toBe(true);

    const athletes = await t.dataSource.getRepository(Athlete).find({ relations: { user: true } });
    for (const athlete of athletes) {
      expect(athlete.status).toBe('active');
      expect(athlete.intakeCompletedAt).toBeInstanceOf(Date);
      const consents = await t.dataSource.getRepository(Consent).findBy({ userId: athlete.userId });
      expect(consents.map((c) => c.kind).sort()).toEqual(['photo_consent', 'safety_acknowledgement']);
    }

    const byEmail = new Map(athletes.map((a) => [a.user!.email, a]));
    const finalWeek = byEmail.get('athlete@driftmark.test')!;
    expect(finalWeek.eventType).toBe('show');
    // 11:30 UTC on 1 December is 12:30 in Madrid: the show is on 5 December there.
    expect(finalWeek.eventDate).toBe('2026-12-05');
    // 11:30 UTC on 1 December is already 2 December in Auckland.
    const weighIn = athletes.find((a) => a.eventType === 'weigh_in')!;
    expect(weighIn.eventDate).toBe(addDays(localDate(seededAt, 'Pacific/Auckland'), 10));
    expect(weighIn.eventDate).toBe('2026-12-12');
    expect(weighIn.weighInLimitKg).toBe(63);

    const assistant = users.find((u) => u.role === 'assistant')!;
    const shares = await t.dataSource
      .getRepository(AthleteShare)
      .find({ relations: { athlete: { user: true } } });
    expect(shares.every((s) => s.userId === assistant.id)).toBe(true);
    expect(shares.map((s) => s.athlete!.user!.email).sort()).toEqual(
      DEMO_ATHLETES.filter((d) => d.sharedWithAssistant)
        .map((d) => d.email)
        .sort(),
    );
  });

  it('gives every demo account the demo password, and each one signs in through the API', async () => {
    const emails = [...DEMO_STAFF, ...DEMO_ATHLETES].map((d) => d.email);
    const users = await t.dataSource.getRepository(User).find();
    expect(users.map((u) => u.email).sort()).toEqual([...emails].sort());
    const [hash] = new Set(users.map((u) => u.passwordHash));
    expect(new Set(users.map((u) => u.passwordHash)).size).toBe(1);
    expect(hash).toMatch(/^\$2[aby]\$12\$/);
    expect(await bcrypt.compare(DEMO_PASSWORD, hash!)).toBe(true);

    for (const email of emails) {
      const agent = await signedIn(t.app, email, DEMO_PASSWORD);
      const me = await agent.get('/api/me');
      expect(me.status, email).toBe(200);
      expect(me.body.data.email).toBe(email);
      expect(me.body.data.intakeComplete).toBe(true);
      expect(me.body.data.team.name).toBe(DEMO_TEAM_NAME);
    }
  });
});
