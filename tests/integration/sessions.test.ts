import jwt from 'jsonwebtoken';
import request from 'supertest';
import { afterAll, beforeAll, beforeEach, describe, expect, it } from 'vitest';
import { loadConfig } from '../../api/src/config.js';
import { Session } from '../../api/src/entities/session.entity.js';
import type { User } from '../../api/src/entities/user.entity.js';
import { createAthlete } from '../factories/athletes.js';
import { FACTORY_PASSWORD } from '../factories/password.js';
import { createOwner } from '../factories/users.js';
import { buildTestApp, sessionCookie, sessionCookieLine, type TestApp } from './setup/app.js';
import { APP_ORIGIN } from './setup/config.js';

/**
 * Sessions on a pinned clock: the idle end slides with use, the absolute end does not, athletes
 * and staff get their own lifetimes (the defaults in config.ts: athlete 30 days idle / 90 days
 * absolute, staff 12 h / 14 days; the token is replaced after 15 minutes). Cookies are carried
 * by hand: a cookie jar would judge their expiry by the real clock, not the app's.
 */
const START = new Date('2026-03-02T07:00:00Z');
let now = START;
const MINUTE = 60_000;
const HOUR = 60 * MINUTE;
const DAY = 24 * HOUR;
const at = (ms: number) => new Date(START.getTime() + ms);

const PHONE_UA =
  'Mozilla/5.0 (iPhone; CPU iPhone OS 13_5_1 like Mac OS X) AppleWebKit/605.1.15 (KHTML, like Gecko) Version/13.1.1 Mobile/15E148 Safari/604.1';
const LAPTOP_UA = 'Mozilla/5.0 (Windows NT 6.1; Win64; x64; rv:47.0) Gecko/20100101 Firefox/47.0';

let t: TestApp;
beforeAll(async () => {
  // The configured defaults, not the long lifetimes the other test files run with.
  const { sessionLifetimes } = loadConfig({ APP_MODE: 'test', ...process.env });
  t = await buildTestApp({ sessionLifetimes }, { clock: () => now });
});
afterAll(() => t.close());
beforeEach(async () => {
  now = START;
  await t.reset();
});

async function signIn(user: User, userAgent = LAPTOP_UA): Promise<string> {
  const res = await request(t.app)
    .post('/api/auth/sign-in')
    .set('Origin', APP_ORIGIN)
    .set('User-Agent', userAgent)
    .send({ email: user.email, password: FACTORY_PASSWORD });
  expect(res.status).toBe(200);
  return sessionCookie(res)!;
}

/** GET with a cookie; answers the response and the cookie to carry on (the refreshed one if any). */
async function get(path: string, cookie: string) {
  const res = await request(t.app).get(path).set('Cookie', cookie);
  return { res, cookie: sessionCookie(res) ?? cookie };
}

const claimsOf = (cookie: string) =>
  jwt.decode(cookie.slice('dm_session='.length)) as { sid: string; iat: number; exp: number };
const seconds = (d: Date) => Math.floor(d.getTime() / 1000);

async function athleteUser(): Promise<User> {
  const owner = await createOwner(t.dataSource);
  return (await createAthlete(t.dataSource, { coach: owner })).user;
}

describe('sliding renewal', () => {
  it('replaces the token only once it is 15 minutes old, moving "last seen" then and only then', async () => {
    const athlete = await athleteUser();
    let cookie = await signIn(athlete);
    const sid = claimsOf(cookie).sid;
    const rows = t.dataSource.getRepository(Session);

    now = at(14 * MINUTE);
    const young = await get('/api/me', cookie);
    expect(young.res.status).toBe(200);
    expect(sessionCookie(young.res)).toBeUndefined();
    expect((await rows.findOneByOrFail({ id: sid })).lastSeenAt).toEqual(START);

    now = at(15 * MINUTE);
    const old = await get('/api/me', cookie);
    expect(old.res.status).toBe(200);
    cookie = old.cookie;
    expect(claimsOf(cookie)).toMatchObject({
      sid,
      iat: seconds(now),
      exp: seconds(at(15 * MINUTE + 30 * DAY)),
    });
    expect((await rows.findOneByOrFail({ id: sid })).lastSeenAt).toEqual(now);
  });

  it('keeps an athlete signed in while used at least every 30 days, until 90 days after sign-in', async () => {
    const athlete = await athleteUser();
    let cookie = await signIn(athlete);
    // Sign-in: the JWT ends at the idle end (the cookie lives on a week past the absolute end, to say why it ended).
    expect(claimsOf(cookie).exp).toBe(seconds(at(30 * DAY)));

    for (const day of [29, 58, 87]) {
      now = at(day * DAY);
      const step = await get('/api/me', cookie);
      expect(step.res.status, `day ${day}`).toBe(200);
      cookie = step.cookie;
    }
    // Renewed on day 87, but never past the absolute end on day 90.
    expect(claimsOf(cookie).exp).toBe(seconds(at(90 * DAY)));
    now = at(90 * DAY - MINUTE);
    expect((await get('/api/me', cookie)).res.status).toBe(200);

    now = at(90 * DAY);
    const ended = await get('/api/me', cookie);
    expect(ended.res.status).toBe(401);
    expect(ended.res.body.error.code).toBe('session_ended');
    expect(sessionCookieLine(ended.res)).toMatch(/Expires=Thu, 01 Jan 1970/);
  });

  it('ends an athlete session left unused for 30 days', async () => {
    const athlete = await athleteUser();
    const cookie = await signIn(athlete);
    now = at(30 * DAY - MINUTE);
    expect((await get('/api/me', cookie)).res.status).toBe(200);

    const fresh = await signIn(athlete);
    now = at(30 * DAY - MINUTE + 30 * DAY);
    const ended = await get('/api/me', fresh);
    expect(ended.res.status).toBe(401);
    expect(ended.res.body.error).toMatchObject({
      code: 'session_ended',
      message: expect.stringMatching(/ended/),
    });
  });
});

describe('staff lifetime', () => {
  it('ends a staff session after 12 idle hours, where an athlete session lives on', async () => {
    const owner = await createOwner(t.dataSource);
    const { user: athlete } = await createAthlete(t.dataSource, { coach: owner });
    const staffCookie = await signIn(owner);
    const athleteCookie = await signIn(athlete);
    expect(claimsOf(staffCookie).exp).toBe(seconds(at(12 * HOUR)));

    now = at(12 * HOUR);
    const staff = await get('/api/me', staffCookie);
    expect(staff.res.status).toBe(401);
    expect(staff.res.body.error.code).toBe('session_ended');
    expect((await get('/api/me', athleteCookie)).res.status).toBe(200);
  });

  it('ends a staff session 14 days after sign-in however busy', async () => {
    const owner = await createOwner(t.dataSource);
    let cookie = await signIn(owner);
    for (let hours = 10; hours < 14 * 24; hours += 10) {
      now = at(hours * HOUR);
      const step = await get('/api/me', cookie);
      expect(step.res.status, `hour ${hours}`).toBe(200);
      cookie = step.cookie;
    }
    now = at(14 * DAY);
    expect((await get('/api/me', cookie)).res.body.error.code).toBe('session_ended');
  });

  it('sets the cookie to outlive the session by a week, so a late return hears why it ended', async () => {
    const owner = await createOwner(t.dataSource);
    const res = await request(t.app)
      .post('/api/auth/sign-in')
      .set('Origin', APP_ORIGIN)
      .send({ email: owner.email, password: FACTORY_PASSWORD });
    // Staff: 14 days absolute + 7, as a duration (the browser counts it on its own clock).
    expect(sessionCookieLine(res)).toContain(`Max-Age=${(21 * DAY) / 1000};`);
  });
});

describe('signed-in devices', () => {
  it('lists the user’s live devices, this one marked and first, and signs one out', async () => {
    const athlete = await athleteUser();
    const laptop = await signIn(athlete, LAPTOP_UA);
    now = at(HOUR);
    const phone = await signIn(athlete, PHONE_UA);
    // The laptop, seen last, still comes after this device.
    now = at(HOUR + 5 * MINUTE);
    await signIn(athlete, LAPTOP_UA);

    // Within the phone's refresh interval: listing does not move its "last seen".
    now = at(HOUR + 10 * MINUTE);
    const list = await get('/api/me/sessions', phone);
    expect(list.res.status).toBe(200);
    expect(list.res.body.data).toEqual([
      expect.objectContaining({
        device: 'Safari on iPhone',
        current: true,
        lastSeenAt: at(HOUR).toISOString(),
        signedInAt: at(HOUR).toISOString(),
        endsAt: at(HOUR + 30 * DAY).toISOString(),
      }),
      expect.objectContaining({
        device: 'Firefox on Windows',
        current: false,
        lastSeenAt: at(HOUR + 5 * MINUTE).toISOString(),
      }),
      expect.objectContaining({
        device: 'Firefox on Windows',
        current: false,
        signedInAt: START.toISOString(),
        lastSeenAt: START.toISOString(),
      }),
    ]);
    const laptopId = list.res.body.data[2].id as string;
    expect(laptopId).toBe(claimsOf(laptop).sid);

    const out = await request(t.app)
      .delete(`/api/me/sessions/${laptopId}`)
      .set('Origin', APP_ORIGIN)
      .set('Cookie', phone);
    expect(out.status).toBe(204);

    const gone = await get('/api/me', laptop);
    expect(gone.res.status).toBe(401);
    expect(gone.res.body.error.code).toBe('session_revoked');
    expect((await get('/api/me', phone)).res.status).toBe(200);
    expect((await get('/api/me/sessions', phone)).res.body.data).toHaveLength(2);
  });

  it('answers 404 for another user’s session id, an unknown one and a malformed one, and revokes nothing', async () => {
    const owner = await createOwner(t.dataSource);
    const { user: athlete } = await createAthlete(t.dataSource, { coach: owner });
    const ownerCookie = await signIn(owner);
    const athleteCookie = await signIn(athlete);
    const athleteSid = claimsOf(athleteCookie).sid;

    for (const id of [athleteSid, '00000000-0000-4000-8000-000000000000', 'not-an-id']) {
      const res = await request(t.app)
        .delete(`/api/me/sessions/${id}`)
        .set('Origin', APP_ORIGIN)
        .set('Cookie', ownerCookie);
      expect(res.status, id).toBe(404);
      expect(res.body.error.code).toBe('not_found');
    }
    expect(
      (await t.dataSource.getRepository(Session).findOneByOrFail({ id: athleteSid })).revokedAt,
    ).toBeNull();
    expect((await get('/api/me', athleteCookie)).res.status).toBe(200);
    // The owner's list shows only the owner's own device.
    expect((await get('/api/me/sessions', ownerCookie)).res.body.data).toHaveLength(1);
  });

  it('signs out every other device and keeps this one', async () => {
    const athlete = await athleteUser();
    const here = await signIn(athlete);
    const others = [await signIn(athlete, PHONE_UA), await signIn(athlete)];
    const res = await request(t.app)
      .post('/api/me/sessions/sign-out-others')
      .set('Origin', APP_ORIGIN)
      .set('Cookie', here);
    expect(res.status).toBe(200);
    expect(res.body.data).toEqual({ signedOut: 2 });
    for (const cookie of others)
      expect((await get('/api/me', cookie)).res.body.error.code).toBe('session_revoked');
    expect((await get('/api/me/sessions', here)).res.body.data).toEqual([
      expect.objectContaining({ current: true }),
    ]);
  });

  it('signing out this device from the list clears its cookie', async () => {
    const athlete = await athleteUser();
    const cookie = await signIn(athlete);
    const res = await request(t.app)
      .delete(`/api/me/sessions/${claimsOf(cookie).sid}`)
      .set('Origin', APP_ORIGIN)
      .set('Cookie', cookie);
    expect(res.status).toBe(204);
    expect(sessionCookieLine(res)).toMatch(/Expires=Thu, 01 Jan 1970/);
  });

  it('leaves an ended session out of the list and answers 404 for signing it out', async () => {
    const owner = await createOwner(t.dataSource);
    const stale = await signIn(owner);
    now = at(11 * HOUR);
    const fresh = await signIn(owner);
    now = at(13 * HOUR);
    const list = await get('/api/me/sessions', fresh);
    expect(list.res.body.data).toEqual([expect.objectContaining({ current: true })]);
    const res = await request(t.app)
      .delete(`/api/me/sessions/${claimsOf(stale).sid}`)
      .set('Origin', APP_ORIGIN)
      .set('Cookie', list.cookie);
    expect(res.status).toBe(404);
  });
});
