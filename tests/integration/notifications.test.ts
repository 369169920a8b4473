/**
 * Notification e-mails end to end: the triggering request (or scheduler tick), the outbox, the
 * mail worker, the SMTP fake's captured JSON. Preferences, unsubscribe links and the scheduler's
 * once-per-due-time guarantee across time zones, daylight-saving changes and restarts.
 */
import { mkdtemp, rm } from 'node:fs/promises';
import os from 'node:os';
import path from 'node:path';
import request from 'supertest';
import { afterAll, afterEach, beforeAll, beforeEach, describe, expect, it } from 'vitest';
import type { User } from '../../api/src/entities/user.entity.js';
import { startMailWorker, type MailWorker } from '../../api/src/jobs/mail.worker.js';
import {
  runNotifyTick,
  startNotifyScheduler,
  type NotifyScheduler,
} from '../../api/src/jobs/notify.scheduler.js';
import { createLogger } from '../../api/src/logger.js';
import { readAllCapturedMail, type CapturedMail } from '../../scripts/src/lib/smtp-fake.js';
import { startSmtpFake, type SmtpFake } from '../../scripts/src/lib/smtp-fake.js';
import { createAthlete, shareAthlete, type CreatedAthlete } from '../factories/athletes.js';
import { FACTORY_PASSWORD } from '../factories/password.js';
import { createAssistant, createCoach } from '../factories/users.js';
import { symptomBody } from './check-ins-helpers.js';
import { buildTestApp, signedIn, type TestApp } from './setup/app.js';
import { APP_ORIGIN } from './setup/config.js';

const logger = createLogger('silent');
let now = new Date('2026-12-01T15:00:00Z');
let t: TestApp;
let captureDir: string;
let smtp: SmtpFake;
let worker: MailWorker | null = null;
const schedulers: NotifyScheduler[] = [];

beforeAll(async () => {
  captureDir = await mkdtemp(path.join(os.tmpdir(), 'dm-notify-'));
  smtp = await startSmtpFake({ port: 0, captureDir });
  t = await buildTestApp(
    { smtpUrl: `smtp://127.0.0.1:${smtp.port}`, mailCaptureDir: captureDir },
    { clock: () => now },
  );
});
afterAll(async () => {
  await worker?.stop();
  await t?.close();
  await smtp?.close();
  if (captureDir) await rm(captureDir, { recursive: true, force: true });
});
beforeEach(async () => {
  await t.reset();
  now = new Date('2026-12-01T15:00:00Z');
});
afterEach(async () => {
  await Promise.all(schedulers.splice(0).map((s) => s.stop()));
});

async function ensureWorker(): Promise<MailWorker> {
  worker ??= await startMailWorker({
    config: t.config,
    dataSource: t.dataSource,
    logger,
    tuning: { pollingIntervalSeconds: 0.5, retryDelaySeconds: 1, sweepCron: null, stopTimeoutMs: 5_000 },
  });
  return worker;
}

/** Delivers everything pending (sweep) and waits until `count` mails to `to` were captured. */
async function mailsTo(to: string, count: number, timeoutMs = 15_000): Promise<CapturedMail[]> {
  const w = await ensureWorker();
  const deadline = Date.now() + timeoutMs;
  for (;;) {
    await w.sweep();
    const found = (await readAllCapturedMail(captureDir)).filter((m) => m.to.includes(to));
    if (found.length >= count || Date.now() > deadline) return found.reverse();
    await new Promise((r) => setTimeout(r, 200));
  }
}

async function outboxKinds(to: string): Promise<string[]> {
  const rows: { kind: string }[] = await t.dataSource.query(
    'SELECT kind FROM outbox_messages WHERE to_address = $1 ORDER BY created_at',
    [to],
  );
  return rows.map((r) => r.kind);
}

const linkIn = (text: string, pathPrefix: string): string => {
  const found = text.split(/\s+/).find((word) => word.startsWith(`${APP_ORIGIN}${pathPrefix}`));
  if (!found) throw new Error(`no ${pathPrefix} link in:\n${text}`);
  return found;
};

interface World {
  coach: User;
  assistant: User;
  athlete: CreatedAthlete;
}

async function world(athleteUser: Partial<User> = {}): Promise<World> {
  const coach = await createCoach(t.dataSource, { name: 'Mara Lindqvist' });
  const assistant = await createAssistant(t.dataSource, { teamId: coach.teamId, name: 'Ivo Bassett' });
  const athlete = await createAthlete(t.dataSource, {
    coach,
    user: { name: 'Tess Okoro', timeZone: 'UTC', ...athleteUser },
  });
  await shareAthlete(t.dataSource, athlete.athlete, assistant);
  return { coach, assistant, athlete };
}

const as = (user: { email: string }) => signedIn(t.app, user.email, FACTORY_PASSWORD);

describe('event e-mails', () => {
  it('mails a safety flag to the coach and shared staff, linking to the day', async () => {
    const w = await world();
    const agent = await as(w.athlete.user);
    const res = await agent
      .post(`/api/athletes/${w.athlete.athlete.id}/days/2026-12-01/symptoms`)
      .send(symptomBody(['fainting']));
    expect(res.status).toBe(201);

    for (const staff of [w.coach, w.assistant]) {
      const [mail, extra] = await mailsTo(staff.email, 1);
      expect(extra).toBeUndefined();
      expect(mail?.subject).toBe('Safety flag: Tess Okoro');
      expect(mail?.text).toContain('Urgent symptoms reported at 10:00: Fainting');
      expect(linkIn(mail?.text ?? '', '/coach/athletes/')).toBe(
        `${APP_ORIGIN}/coach/athletes/${w.athlete.athlete.id}?date=2026-12-01`,
      );
      expect(mail?.html).toContain('Safety flag for Tess Okoro');
    }
    expect(await outboxKinds(w.athlete.user.email)).toEqual([]);
  });

  it('sends no flag e-mail to a coach who turned safety flags off', async () => {
    const w = await world();
    const coach = await as(w.coach);
    const put = await coach.put('/api/me/notifications').send({
      enabled: {
        safety_flag: false,
        weekly_check_in_received: true,
        mark_reply: true,
        weekly_summary: true,
        over_limit: true,
        morning_reminder: true,
        coach_note: true,
        weekly_check_in_due: true,
      },
      reminderHour: null,
    });
    expect(put.status).toBe(200);
    expect(put.body.data.enabled.safety_flag).toBe(false);
    const agent = await as(w.athlete.user);
    await agent
      .post(`/api/athletes/${w.athlete.athlete.id}/days/2026-12-01/symptoms`)
      .send(symptomBody(['palpitations']));
    await mailsTo(w.assistant.email, 1);
    expect(await outboxKinds(w.coach.email)).toEqual([]);
    expect(await outboxKinds(w.assistant.email)).toEqual(['safety_flag']);
  });

  it('mails a new mark to the athlete, the reply to the mark author, and the coach reply back', async () => {
    const w = await world();
    const coach = await as(w.coach);
    const athlete = await as(w.athlete.user);
    const mark = await coach.post(`/api/athletes/${w.athlete.athlete.id}/marks`).send({
      metric: 'weight',
      fromDate: '2026-11-24',
      toDate: '2026-11-28',
      note: 'Water load days: weight up as expected',
    });
    expect(mark.status).toBe(201);
    const markId = mark.body.data.id as string;

    const [created] = await mailsTo(w.athlete.user.email, 1);
    expect(created?.subject).toBe('Mara Lindqvist left a note on your chart');
    expect(created?.text).toContain('2026-11-24 to 2026-11-28');
    expect(linkIn(created?.text ?? '', '/athlete/trends')).toBe(
      `${APP_ORIGIN}/athlete/trends?mark=${markId}`,
    );

    now = new Date(now.getTime() + 60_000);
    expect((await athlete.post(`/api/marks/${markId}/replies`).send({ body: 'Felt flat too' })).status).toBe(
      201,
    );
    const [reply] = await mailsTo(w.coach.email, 1);
    expect(reply?.subject).toBe('Tess Okoro replied to a note');
    expect(reply?.text).toContain('Felt flat too');
    expect(linkIn(reply?.text ?? '', '/coach/athletes/')).toBe(
      `${APP_ORIGIN}/coach/athletes/${w.athlete.athlete.id}/trends?mark=${markId}`,
    );
    // The shared assistant did not write the mark: no mail for them.
    expect(await outboxKinds(w.assistant.email)).toEqual([]);

    now = new Date(now.getTime() + 60_000);
    expect((await coach.post(`/api/marks/${markId}/replies`).send({ body: 'Good, keep going' })).status).toBe(
      201,
    );
    const athleteMails = await mailsTo(w.athlete.user.email, 2);
    expect(athleteMails.map((m) => m.subject)).toEqual([
      'Mara Lindqvist left a note on your chart',
      'Mara Lindqvist replied to a note',
    ]);
    expect(athleteMails[1]?.text).toContain('Good, keep going');
    // Nobody gets their own reply.
    expect(await outboxKinds(w.coach.email)).toEqual(['mark_reply']);
  });
});

describe('weekly check-in e-mails', () => {
  it('mails the coach and shared staff once when a check-in arrives, and the athlete when answered', async () => {
    const w = await world();
    const athlete = await as(w.athlete.user);
    const base = `/api/athletes/${w.athlete.athlete.id}/weekly-check-ins`;
    const current = await athlete.get(`${base}/current`);
    expect(current.status).toBe(200);
    const dueDate = current.body.data.dueDate as string;
    const submit = (questionsForCoach: string) =>
      athlete.post(base).send({ dueDate, answers: [], questionsForCoach });
    const first = await submit('Can I move my refeed to Saturday?');
    expect(first.status, JSON.stringify(first.body)).toBeLessThan(300);
    now = new Date(now.getTime() + 60_000);
    expect((await submit('Can I move my refeed to Sunday?')).status).toBeLessThan(300);

    const [received, again] = await mailsTo(w.coach.email, 1);
    expect(again).toBeUndefined();
    expect(received?.subject).toBe('Weekly check-in from Tess Okoro');
    expect(received?.text).toContain(`the week up to ${dueDate}`);
    expect(received?.text).toContain('Their questions for you: Can I move my refeed to Saturday?');
    const link = linkIn(received?.text ?? '', '/coach/athletes/');
    expect(link).toMatch(new RegExp(`/coach/athletes/${w.athlete.athlete.id}/weekly/[0-9a-f-]{36}$`));
    expect(await outboxKinds(w.assistant.email)).toEqual(['weekly_check_in_received']);

    const checkInId = link.split('/').pop() ?? '';
    const coach = await as(w.coach);
    const reply = await coach
      .post(`/api/weekly-check-ins/${checkInId}/reply`)
      .send({ body: 'Yes, Sunday works.' });
    expect(reply.status, JSON.stringify(reply.body)).toBeLessThan(300);
    const [answered] = await mailsTo(w.athlete.user.email, 1);
    expect(answered?.subject).toBe('Mara Lindqvist answered your weekly check-in');
    expect(answered?.text).toContain('Yes, Sunday works.');
    expect(linkIn(answered?.text ?? '', '/athlete/weekly')).toBe(`${APP_ORIGIN}/athlete/weekly`);
  });
});

describe('preferences and unsubscribe', () => {
  it('answers every kind (missing ones wanted) and the athlete reminder hour', async () => {
    const w = await world();
    const athlete = await as(w.athlete.user);
    const res = await athlete.get('/api/me/notifications');
    expect(res.status).toBe(200);
    expect(res.body.data.enabled.morning_reminder).toBe(true);
    expect(res.body.data.reminderHour).toBe(9);
    const bad = await athlete.put('/api/me/notifications').send({ enabled: {}, reminderHour: 24 });
    expect(bad.status).toBe(400);
    expect((await request(t.app).get('/api/me/notifications')).status).toBe(401);
  });

  it('one-click unsubscribe from a reminder stops that kind only; bad tokens are refused', async () => {
    const w = await world();
    now = new Date('2026-12-01T10:00:00Z');
    await runNotifyTick(t.dataSource, now);
    const [mail] = await mailsTo(w.athlete.user.email, 1);
    expect(mail?.subject).toBe('No weigh-in yet today');
    const header = mail?.listUnsubscribe ?? '';
    expect(mail?.listUnsubscribePost).toBe('List-Unsubscribe=One-Click');
    const url = new URL(header.replace(/^<|>$/g, ''));
    expect(url.origin + url.pathname).toBe(`${APP_ORIGIN}/api/unsubscribe`);
    const token = url.searchParams.get('token') ?? '';
    // The page link in the body carries a token for the same kind.
    expect(linkIn(mail?.text ?? '', '/unsubscribe?token=')).toContain('/unsubscribe?token=');

    const view = await request(t.app).get(`/api/unsubscribe?token=${encodeURIComponent(token)}`);
    expect(view.body.data).toEqual({
      kind: 'morning_reminder',
      label: 'Morning reminder when no weigh-in is logged',
      email: w.athlete.user.email,
      done: false,
    });
    // RFC 8058: a mail client POSTs the form body to the header's URL, with no Origin and no cookie.
    const post = await request(t.app)
      .post(`/api/unsubscribe?token=${encodeURIComponent(token)}`)
      .type('form')
      .send('List-Unsubscribe=One-Click');
    expect(post.status).toBe(200);
    expect(post.body.data.done).toBe(true);
    const prefs = await (await as(w.athlete.user)).get('/api/me/notifications');
    expect(prefs.body.data.enabled).toMatchObject({ morning_reminder: false, coach_note: true });

    // The next day: no reminder any more.
    now = new Date('2026-12-02T10:00:00Z');
    expect((await runNotifyTick(t.dataSource, now)).morningReminders).toBe(0);

    const forged = await request(t.app)
      .post('/api/unsubscribe')
      .send({ token: `${token.slice(0, -3)}abc` });
    expect(forged.status).toBe(410);
    // A session cookie's JWT (other audience) is no unsubscribe token either.
    expect((await request(t.app).get('/api/unsubscribe?token=not-a-token-at-all')).status).toBe(410);
  });
});

describe('scheduler', () => {
  it('sends the morning reminder once per local date, only without a weigh-in', async () => {
    const w = await world({ timeZone: 'Europe/Berlin' });
    // 07:30 in Berlin (UTC+1): before the default hour 09:00.
    expect((await runNotifyTick(t.dataSource, new Date('2026-12-01T06:30:00Z'))).morningReminders).toBe(0);
    expect((await runNotifyTick(t.dataSource, new Date('2026-12-01T08:00:00Z'))).morningReminders).toBe(1);
    expect((await runNotifyTick(t.dataSource, new Date('2026-12-01T12:00:00Z'))).morningReminders).toBe(0);
    const [mail] = await mailsTo(w.athlete.user.email, 1);
    expect(mail?.text).toContain('There is no weigh-in for today (2026-12-01) yet.');
    expect(linkIn(mail?.text ?? '', '/athlete')).toBe(`${APP_ORIGIN}/athlete`);

    // Next day the athlete weighed in before the reminder hour: nothing.
    now = new Date('2026-12-02T06:00:00Z');
    const agent = await as(w.athlete.user);
    const weighed = await agent
      .put(`/api/athletes/${w.athlete.athlete.id}/days/2026-12-02/weigh-in`)
      .send({ weight: 61.2, unit: 'kg', time: '06:45', protocolConfirmed: true, tags: [] });
    expect(weighed.status).toBe(200);
    expect((await runNotifyTick(t.dataSource, new Date('2026-12-02T09:00:00Z'))).morningReminders).toBe(0);
  });

  it('follows the athlete’s clock in America/New_York across both DST changes', async () => {
    await world({ timeZone: 'America/New_York', notificationPrefs: { reminderHour: 7 } });
    const tick = async (iso: string) => (await runNotifyTick(t.dataSource, new Date(iso))).morningReminders;
    // Saturday 13 March 2027, EST (UTC−5): 07:00 local is 12:00 UTC.
    expect(await tick('2027-03-13T11:59:00Z')).toBe(0);
    expect(await tick('2027-03-13T12:00:00Z')).toBe(1);
    // Sunday 14 March 2027, clocks go forward: 07:00 EDT (UTC−4) is 11:00 UTC.
    expect(await tick('2027-03-14T10:59:00Z')).toBe(0);
    expect(await tick('2027-03-14T11:00:00Z')).toBe(1);
    expect(await tick('2027-03-14T12:00:00Z')).toBe(0);
    // Sunday 7 November 2027, clocks go back: 07:00 EST is 12:00 UTC again (11:30 UTC is 06:30).
    expect(await tick('2027-11-07T11:30:00Z')).toBe(0);
    expect(await tick('2027-11-07T12:00:00Z')).toBe(1);
    const keys: { due_key: string }[] = await t.dataSource.query(
      `SELECT due_key FROM notification_sends WHERE kind = 'morning_reminder' ORDER BY due_key`,
    );
    expect(keys.map((k) => k.due_key)).toEqual(['2027-03-13', '2027-03-14', '2027-11-07']);
  });

  it('sends the weekly check-in due e-mail on the check-in day and the weekly summary once per ISO week', async () => {
    const w = await world();
    // Monday 7 December 2026 (default check-in day 'mon'), 10:00 UTC.
    const result = await runNotifyTick(t.dataSource, new Date('2026-12-07T10:00:00Z'));
    expect(result).toEqual({ morningReminders: 1, weeklyCheckInsDue: 1, weeklySummaries: 2 });
    expect(await runNotifyTick(t.dataSource, new Date('2026-12-09T10:00:00Z'))).toEqual({
      morningReminders: 1,
      weeklyCheckInsDue: 0,
      weeklySummaries: 0,
    });
    const athleteMails = await mailsTo(w.athlete.user.email, 3);
    const due = athleteMails.find((m) => m.subject === 'Your weekly check-in is due');
    expect(due?.text).toContain('week up to 2026-12-07');
    expect(linkIn(due?.text ?? '', '/athlete/weekly')).toBe(`${APP_ORIGIN}/athlete/weekly`);
    expect(due?.listUnsubscribe).toMatch(/^<http.*\/api\/unsubscribe\?token=/);

    const [summary] = await mailsTo(w.coach.email, 1);
    expect(summary?.subject).toBe('Your roster, week 2026-W50');
    expect(summary?.text).toContain('Tess Okoro: 0/7 weigh-ins, 0 safety flags, weekly check-in missing');
    expect(linkIn(summary?.text ?? '', '/coach')).toBe(`${APP_ORIGIN}/coach`);
  });

  it('sends no weekly check-in due e-mail to an athlete who joined that day (nothing is due before joining)', async () => {
    const w = await world();
    // Joined Monday 7 December 2026 at 08:00 UTC; the check-in due that day covers the week before.
    await t.dataSource.query(`UPDATE athletes SET intake_completed_at = $2 WHERE id = $1`, [
      w.athlete.athlete.id,
      new Date('2026-12-07T08:00:00Z'),
    ]);
    expect((await runNotifyTick(t.dataSource, new Date('2026-12-07T10:00:00Z'))).weeklyCheckInsDue).toBe(0);
    // The next Monday it is due as usual.
    expect((await runNotifyTick(t.dataSource, new Date('2026-12-14T10:00:00Z'))).weeklyCheckInsDue).toBe(1);
  });

  it('loses and doubles nothing when stopped between due times and started again', async () => {
    const coach = await createCoach(t.dataSource);
    const early = await createAthlete(t.dataSource, {
      coach,
      user: { timeZone: 'UTC', notificationPrefs: { reminderHour: 7 } },
    });
    const late = await createAthlete(t.dataSource, {
      coach,
      user: { timeZone: 'UTC', notificationPrefs: { reminderHour: 8 } },
    });
    const start = async (at: string) => {
      now = new Date(at);
      const s = await startNotifyScheduler({
        config: t.config,
        dataSource: t.dataSource,
        logger,
        clock: () => now,
        tuning: { cron: null, pollingIntervalSeconds: 1 },
      });
      schedulers.push(s);
      return s;
    };
    // Tuesday 1 Dec 2026: 07:30 → the early athlete is due, the late one not yet.
    const first = await start('2026-12-01T07:30:00Z');
    expect((await first.tick()).morningReminders).toBe(0); // the start tick already sent it
    await first.stop();
    // 08:00 passes while nothing runs. A restart at 08:20 catches up the late one only.
    const second = await start('2026-12-01T08:20:00Z');
    expect((await second.tick()).morningReminders).toBe(0);
    await second.stop();
    // A second restart the same day sends nothing again.
    await start('2026-12-01T09:00:00Z');

    const [e, eExtra] = await mailsTo(early.user.email, 1);
    const [l, lExtra] = await mailsTo(late.user.email, 1);
    expect(e?.subject).toBe('No weigh-in yet today');
    expect(l?.subject).toBe('No weigh-in yet today');
    await new Promise((r) => setTimeout(r, 1000));
    expect(await outboxKinds(early.user.email)).toEqual(['morning_reminder']);
    expect(await outboxKinds(late.user.email)).toEqual(['morning_reminder']);
    expect(eExtra).toBeUndefined();
    expect(lExtra).toBeUndefined();
  });
});
