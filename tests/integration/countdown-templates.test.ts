import {
  countdownPreview,
  dayView,
  planVersionView,
  templateView,
  type CountdownPreview,
} from '@driftmark/shared';
import { afterAll, beforeAll, beforeEach, describe, expect, it } from 'vitest';
import type { User } from '../../api/src/entities/user.entity.js';
import { createAthlete, shareAthlete, type CreatedAthlete } from '../factories/athletes.js';
import { FACTORY_PASSWORD } from '../factories/password.js';
import { createAssistant, createCoach, createOwner } from '../factories/users.js';
import { weighInBody } from './check-ins-helpers.js';
import { countPlanRows, planContent, planRows, templateBody, versionBody } from './plans-helpers.js';
import { buildTestApp, signedIn, type TestApp } from './setup/app.js';

// Tuesday 1 December 2026, 11:00 in Madrid. The event on Thursday 3 December makes today E-2.
const TODAY = '2026-12-01';
const EVENT = '2026-12-03';
const now = new Date('2026-12-01T10:00:00Z');

let t: TestApp;
beforeAll(async () => {
  t = await buildTestApp({}, { clock: () => now });
});
afterAll(() => t.close());

type Agent = Awaited<ReturnType<typeof signedIn>>;
let owner: User;
let coach: User;
let assistant: User;
let me: CreatedAthlete;
let coachAgent: Agent;
let base: string;

beforeEach(async () => {
  await t.reset();
  owner = await createOwner(t.dataSource);
  coach = await createCoach(t.dataSource, { teamId: owner.teamId });
  assistant = await createAssistant(t.dataSource, { teamId: owner.teamId });
  me = await createAthlete(t.dataSource, { coach, user: { timeZone: 'Europe/Madrid' } });
  coachAgent = await signedIn(t.app, coach.email, FACTORY_PASSWORD);
  base = `/api/athletes/${me.athlete.id}`;
});

const createTemplate = async (agent: Agent = coachAgent, body = templateBody()) => {
  const res = await agent.post('/api/countdown-templates').send(body);
  expect(res.status).toBe(201);
  return templateView.parse(res.body.data);
};

/** Three mornings at 60 kg: the trend weight is 60 kg (Walker's EWMA of equal weights). */
async function weighIns() {
  const athlete = await signedIn(t.app, me.user.email, FACTORY_PASSWORD);
  for (const date of ['2026-11-29', '2026-11-30', TODAY]) {
    expect(
      (await athlete.put(`${base}/days/${date}/weigh-in`).send(weighInBody({ weight: 60 }))).status,
    ).toBe(200);
  }
  return athlete;
}

describe('the template library', () => {
  it('creates, lists, reads, replaces and deletes a template (days ordered by offset)', async () => {
    const body = templateBody();
    const created = await createTemplate(coachAgent, { ...body, days: [...body.days].reverse() });
    expect(created).toMatchObject({ name: 'Test show week', eventType: 'show', createdBy: { id: coach.id } });
    expect(created.days.map((d) => d.offset)).toEqual([-3, -2, -1, 0, 1]);

    const helper = await signedIn(t.app, assistant.email, FACTORY_PASSWORD);
    const list = await helper.get('/api/countdown-templates');
    expect(list.status).toBe(200);
    expect(list.body.abilities).toEqual({ manage: false });
    expect(list.body.data.map((v: { id: string }) => v.id)).toEqual([created.id]);
    expect((await coachAgent.get('/api/countdown-templates')).body.abilities).toEqual({ manage: true });

    const one = await helper.get(`/api/countdown-templates/${created.id}`);
    expect(one.status).toBe(200);
    expect(templateView.parse(one.body.data)).toEqual(created);

    const put = await coachAgent
      .put(`/api/countdown-templates/${created.id}`)
      .send({ ...body, name: 'Renamed week', days: body.days.slice(2) });
    expect(put.status).toBe(200);
    expect(put.body.data).toMatchObject({ id: created.id, name: 'Renamed week' });
    expect(put.body.data.days).toHaveLength(3);

    const head = await signedIn(t.app, owner.email, FACTORY_PASSWORD);
    expect((await head.delete(`/api/countdown-templates/${created.id}`)).status).toBe(204);
    expect((await coachAgent.get(`/api/countdown-templates/${created.id}`)).status).toBe(404);
    expect(await countPlanRows(t.dataSource, 'countdown_templates')).toBe(0);
  });

  it('refuses repeated offsets and a missing name, naming the fields', async () => {
    const body = templateBody();
    const twice = await coachAgent
      .post('/api/countdown-templates')
      .send({ ...body, days: [body.days[0], { ...body.days[1], offset: -3 }] });
    expect(twice.status).toBe(400);
    expect(Object.keys(twice.body.error.fields)).toEqual(['days.1.offset']);
    const nameless = await coachAgent.post('/api/countdown-templates').send({ ...body, name: '' });
    expect(nameless.status).toBe(400);
    expect(Object.keys(nameless.body.error.fields)).toEqual(['name']);
    expect(await countPlanRows(t.dataSource, 'countdown_templates')).toBe(0);
  });

  it('keeps teams apart: another team’s coach gets 404 and changes nothing', async () => {
    const mine = await createTemplate();
    const stranger = await createCoach(t.dataSource);
    const them = await signedIn(t.app, stranger.email, FACTORY_PASSWORD);
    const before = await planRows(t.dataSource);
    expect((await them.get('/api/countdown-templates')).body.data).toEqual([]);
    expect((await them.get(`/api/countdown-templates/${mine.id}`)).status).toBe(404);
    expect((await them.put(`/api/countdown-templates/${mine.id}`).send(templateBody())).status).toBe(404);
    expect((await them.delete(`/api/countdown-templates/${mine.id}`)).status).toBe(404);
    expect(await planRows(t.dataSource)).toEqual(before);
  });

  it('lets staff read but only the owner and coaches manage; athletes see no library', async () => {
    const mine = await createTemplate();
    const helper = await signedIn(t.app, assistant.email, FACTORY_PASSWORD);
    const athlete = await signedIn(t.app, me.user.email, FACTORY_PASSWORD);
    const before = await planRows(t.dataSource);
    expect((await helper.post('/api/countdown-templates').send(templateBody())).status).toBe(403);
    expect((await helper.put(`/api/countdown-templates/${mine.id}`).send(templateBody())).status).toBe(403);
    expect((await helper.delete(`/api/countdown-templates/${mine.id}`)).status).toBe(403);
    expect((await athlete.get('/api/countdown-templates')).status).toBe(404);
    expect((await athlete.get(`/api/countdown-templates/${mine.id}`)).status).toBe(404);
    expect((await athlete.post('/api/countdown-templates').send(templateBody())).status).toBe(404);
    expect((await athlete.delete(`/api/countdown-templates/${mine.id}`)).status).toBe(404);
    expect(await planRows(t.dataSource)).toEqual(before);
  });
});

describe('applying a countdown', () => {
  it('previews the dated days from the athlete’s baseline, the past day listed but skipped, saving nothing', async () => {
    await weighIns();
    const template = await createTemplate();
    const before = await planRows(t.dataSource);
    const res = await coachAgent
      .post(`${base}/plan/countdown`)
      .send({ templateId: template.id, eventDate: EVENT, preview: true });
    expect(res.status).toBe(200);
    const preview: CountdownPreview = countdownPreview.parse(res.body.data);
    expect(preview.effectiveFrom).toBe(TODAY);
    expect(preview.days.map((d) => [d.date, d.dayLabel, d.past])).toEqual([
      ['2026-11-30', 'E-3', true],
      ['2026-12-01', 'E-2', false],
      ['2026-12-02', 'E-1', false],
      ['2026-12-03', 'E-0', false],
      ['2026-12-04', 'E+1', false],
    ]);
    // Water load at usual intake + 1 L: 2500 + 1000 = 3500 mL (common practice, no source).
    expect(preview.days[0]!.targets.waterMl).toBe(3500);
    // 5 g/kg carbohydrate × 60 kg trend weight = 300 g.
    expect(preview.days[1]!.targets.carbohydrateG).toBeCloseTo(300, 9);
    // E+1 at usual energy × 1 = 2100 kcal.
    expect(preview.days[4]!.targets.energyKcal).toBe(2100);
    expect(preview.baseline).toMatchObject({ usualWaterMl: 2500, weightKg: 60 });
    expect(preview.content.dates.map((d) => d.date)).toEqual([
      '2026-12-01',
      '2026-12-02',
      '2026-12-03',
      '2026-12-04',
    ]);
    expect(preview.content.countdown).toEqual({
      templateId: template.id,
      templateName: 'Test show week',
      eventDate: EVENT,
      eventType: 'show',
    });
    expect(preview.warnings.map((w) => w.key).sort()).toEqual([
      'fluid_restriction:date:2026-12-02',
      'sodium_low:date:2026-12-02',
    ]);
    expect(await planRows(t.dataSource)).toEqual(before);
  });

  it('refuses without every acknowledgement, then creates a version; the athlete sees E-1 with the cautions', async () => {
    const athlete = await weighIns();
    const template = await createTemplate();
    await coachAgent.post(`${base}/plan/versions`).send(versionBody(TODAY, planContent()));
    const before = await planRows(t.dataSource);

    const refused = await coachAgent
      .post(`${base}/plan/countdown`)
      .send({ templateId: template.id, eventDate: EVENT });
    expect(refused.status).toBe(409);
    expect(refused.body.error.code).toBe('guardrails_unacknowledged');
    const keys = Object.keys(refused.body.error.fields).sort();
    expect(keys).toEqual(['fluid_restriction:date:2026-12-02', 'sodium_low:date:2026-12-02']);
    expect(await planRows(t.dataSource)).toEqual(before);

    const res = await coachAgent
      .post(`${base}/plan/countdown`)
      .send({ templateId: template.id, eventDate: EVENT, acknowledgedKeys: keys });
    expect(res.status).toBe(201);
    const v = planVersionView.parse(res.body.data);
    expect(v).toMatchObject({
      number: 2,
      effectiveFrom: TODAY,
      reason: `Countdown "Test show week" for ${EVENT}`,
      countdown: { templateId: template.id, eventDate: EVENT, eventType: 'show' },
      acknowledgementCount: 2,
      baseline: { weightKg: 60 },
    });
    // The rest of the plan (the weekly pattern of version 1) carries over.
    expect(v.content.dayTypes.map((d) => d.key)).toEqual(['training', 'rest']);

    const e1 = dayView.parse((await athlete.get(`${base}/days/2026-12-02`)).body.data);
    expect(e1.countdown).toEqual({
      eventDate: EVENT,
      eventType: 'show',
      offset: -1,
      dayLabel: 'E-1',
      label: 'Taper',
    });
    expect(e1.targets).toMatchObject({ versionNumber: 2, source: { kind: 'date', label: 'Taper' } });
    expect(e1.targets!.targets.fluidCutoff).toEqual({ time: '18:00', allowanceMl: 250 });
    expect(e1.cautions.map((c) => c.code)).toEqual(['countdown', 'fluid_restriction', 'sodium_low']);
    expect(e1.cautions[0]!.acknowledgedAt).toBeNull();
    expect(e1.cautions[1]!.acknowledgedAt).toBe(v.createdAt);
    // The athlete (mL) reads "your countdown"; a coach reading in fl oz gets staff wording and fl oz.
    expect(e1.cautions[0]!.message).toMatch(/^E-1 of your countdown/);
    expect(e1.cautions[1]!.message).toMatch(/\d mL/);
    await t.dataSource.query(`UPDATE users SET volume_unit = 'floz', weight_unit = 'lb' WHERE id = $1`, [
      coach.id,
    ]);
    const forCoach = dayView.parse((await coachAgent.get(`${base}/days/2026-12-02`)).body.data);
    const firstName = me.user.name.split(' ')[0]!;
    expect(forCoach.cautions[0]!.message).toMatch(new RegExp(`^E-1 of ${firstName}'s? countdown`));
    expect(forCoach.cautions[1]!.message).toMatch(/\d fl oz/);
    expect(forCoach.cautions[1]!.message).not.toMatch(/mL/);

    // Every countdown day carries the standing caution; the day before the countdown none.
    const e2 = dayView.parse((await athlete.get(`${base}/days/${TODAY}`)).body.data);
    expect(e2.countdown?.dayLabel).toBe('E-2');
    expect(e2.cautions.map((c) => c.code)).toEqual(['countdown']);
    const before1 = dayView.parse((await athlete.get(`${base}/days/2026-11-30`)).body.data);
    expect(before1.countdown).toBeNull();
    expect(before1.targets).toBeNull();
  });

  it('refuses a template of another team and an event whose countdown is all in the past', async () => {
    await weighIns();
    const stranger = await createCoach(t.dataSource);
    const foreign = await createTemplate(await signedIn(t.app, stranger.email, FACTORY_PASSWORD));
    const before = await planRows(t.dataSource);
    const res = await coachAgent
      .post(`${base}/plan/countdown`)
      .send({ templateId: foreign.id, eventDate: EVENT, preview: true });
    expect(res.status).toBe(400);
    expect(Object.keys(res.body.error.fields)).toEqual(['templateId']);

    const mine = await createTemplate();
    const past = await coachAgent
      .post(`${base}/plan/countdown`)
      .send({ templateId: mine.id, eventDate: '2026-11-20', preview: true });
    expect(past.status).toBe(400);
    expect(Object.keys(past.body.error.fields)).toEqual(['eventDate']);
    expect(await countPlanRows(t.dataSource, 'plan_versions')).toBe(before.plan_versions!.length);
  });

  it('refuses a template needing a body weight the athlete lacks, naming the day', async () => {
    const template = await createTemplate();
    const res = await coachAgent
      .post(`${base}/plan/countdown`)
      .send({ templateId: template.id, eventDate: EVENT, preview: true });
    expect(res.status).toBe(400);
    expect(res.body.error.code).toBe('validation_failed');
    expect(Object.keys(res.body.error.fields)).toEqual(['content.dates.0.targets.carbohydrate']);
    expect(res.body.error.message).toMatch(/weigh-in/);
  });
});

describe('moving a countdown after the event date changes', () => {
  async function applied() {
    const athlete = await weighIns();
    const template = await createTemplate();
    const keys = ['fluid_restriction:date:2026-12-02', 'sodium_low:date:2026-12-02'];
    const res = await coachAgent
      .post(`${base}/plan/countdown`)
      .send({ templateId: template.id, eventDate: EVENT, acknowledgedKeys: keys });
    expect(res.status).toBe(201);
    return athlete;
  }

  it('names the mismatch on PATCH event, previews the move, and saves it as a new version', async () => {
    const athlete = await applied();
    const patched = await coachAgent.patch(`${base}/event`).send({ eventDate: '2026-12-05' });
    expect(patched.status).toBe(200);
    expect(patched.body.data.athlete.eventDate).toBe('2026-12-05');
    expect(patched.body.data.athlete.countdownMismatch).toEqual({
      countdownEventDate: EVENT,
      eventDate: '2026-12-05',
    });

    const before = await planRows(t.dataSource);
    const preview = await coachAgent
      .post(`${base}/plan/countdown/move`)
      .send({ eventDate: '2026-12-05', preview: true });
    expect(preview.status).toBe(200);
    const p = countdownPreview.parse(preview.body.data);
    expect(p.days.map((d) => [d.date, d.dayLabel])).toEqual([
      ['2026-12-03', 'E-2'],
      ['2026-12-04', 'E-1'],
      ['2026-12-05', 'E-0'],
      ['2026-12-06', 'E+1'],
    ]);
    // The old countdown days from today on stop applying at once.
    expect(p.effectiveFrom).toBe(TODAY);
    expect(await planRows(t.dataSource)).toEqual(before);

    const refused = await coachAgent.post(`${base}/plan/countdown/move`).send({ eventDate: '2026-12-05' });
    expect(refused.status).toBe(409);
    const keys = Object.keys(refused.body.error.fields).sort();
    expect(keys).toEqual(['fluid_restriction:date:2026-12-04', 'sodium_low:date:2026-12-04']);
    const moved = await coachAgent
      .post(`${base}/plan/countdown/move`)
      .send({ eventDate: '2026-12-05', acknowledgedKeys: keys });
    expect(moved.status).toBe(201);
    expect(moved.body.data).toMatchObject({
      number: 2,
      reason: 'Countdown "Test show week" moved to 2026-12-05',
      countdown: { eventDate: '2026-12-05' },
    });

    const oldE1 = dayView.parse((await athlete.get(`${base}/days/2026-12-02`)).body.data);
    expect(oldE1.countdown).toBeNull();
    expect(oldE1.targets?.source.kind).toBe('pattern');
    const newE1 = dayView.parse((await athlete.get(`${base}/days/2026-12-04`)).body.data);
    expect(newE1.countdown).toMatchObject({ eventDate: '2026-12-05', dayLabel: 'E-1', label: 'Taper' });

    // The same date again: nothing left to resolve.
    const same = await coachAgent.patch(`${base}/event`).send({ eventDate: '2026-12-05' });
    expect(same.body.data.athlete.countdownMismatch).toBeNull();
  });

  it('keeps saying the countdown aims elsewhere after a reload, until the countdown moves', async () => {
    const athlete = await applied();
    await coachAgent.patch(`${base}/event`).send({ eventDate: '2026-12-05' });
    // A fresh read (the page reloaded), for the coach and for the athlete alike.
    for (const agent of [coachAgent, athlete]) {
      const profile = await agent.get(base);
      expect(profile.body.data.countdownMismatch).toEqual({
        countdownEventDate: EVENT,
        eventDate: '2026-12-05',
      });
    }
    const keys = ['fluid_restriction:date:2026-12-04', 'sodium_low:date:2026-12-04'];
    const moved = await coachAgent
      .post(`${base}/plan/countdown/move`)
      .send({ eventDate: '2026-12-05', acknowledgedKeys: keys });
    expect(moved.status).toBe(201);
    expect((await coachAgent.get(base)).body.data.countdownMismatch).toBeNull();
  });

  it('moves the event date with the countdown, in one transaction with the version', async () => {
    await applied();
    const keys = ['fluid_restriction:date:2026-12-04', 'sodium_low:date:2026-12-04'];
    const moved = await coachAgent
      .post(`${base}/plan/countdown/move`)
      .send({ eventDate: '2026-12-05', acknowledgedKeys: keys });
    expect(moved.status).toBe(201);
    const profile = (await coachAgent.get(base)).body.data;
    expect(profile).toMatchObject({ eventDate: '2026-12-05', countdownMismatch: null });
    // The projection aims at the event the countdown now counts back from.
    const trend = await coachAgent.get(`${base}/trend?from=2026-11-20&to=${TODAY}`);
    expect(trend.status).toBe(200);
    expect(trend.body.data.eventDate).toBe('2026-12-05');

    // A move refused by the guardrails changes neither the plan nor the event.
    const before = await planRows(t.dataSource);
    const refused = await coachAgent.post(`${base}/plan/countdown/move`).send({ eventDate: '2026-12-06' });
    expect(refused.status).toBe(409);
    expect(await planRows(t.dataSource)).toEqual(before);
    expect((await coachAgent.get(base)).body.data.eventDate).toBe('2026-12-05');
  });

  it('sets the event date when a countdown is applied for another day', async () => {
    await weighIns();
    const template = await createTemplate();
    const keys = ['fluid_restriction:date:2026-12-03', 'sodium_low:date:2026-12-03'];
    const res = await coachAgent
      .post(`${base}/plan/countdown`)
      .send({ templateId: template.id, eventDate: '2026-12-04', acknowledgedKeys: keys });
    expect(res.status).toBe(201);
    expect((await coachAgent.get(base)).body.data).toMatchObject({
      eventDate: '2026-12-04',
      countdownMismatch: null,
    });
  });

  it('answers 409 when the latest version has no countdown', async () => {
    await coachAgent.post(`${base}/plan/versions`).send(versionBody(TODAY));
    const res = await coachAgent
      .post(`${base}/plan/countdown/move`)
      .send({ eventDate: '2026-12-05', preview: true });
    expect(res.status).toBe(409);
    expect(res.body.error.code).toBe('conflict');
    const none = await signedIn(t.app, coach.email, FACTORY_PASSWORD);
    const other = await createAthlete(t.dataSource, { coach });
    expect(
      (await none.post(`/api/athletes/${other.athlete.id}/plan/countdown/move`).send({ eventDate: EVENT }))
        .status,
    ).toBe(409);
  });

  it('lets a shared assistant apply a countdown', async () => {
    await weighIns();
    await shareAthlete(t.dataSource, me.athlete, assistant);
    const template = await createTemplate();
    const helper = await signedIn(t.app, assistant.email, FACTORY_PASSWORD);
    const res = await helper
      .post(`${base}/plan/countdown`)
      .send({ templateId: template.id, eventDate: EVENT, preview: true });
    expect(res.status).toBe(200);
  });
});
