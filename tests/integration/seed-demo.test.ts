import bcrypt from 'bcryptjs';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { Athlete } from '../../api/src/entities/athlete.entity.js';
import { AthleteShare } from '../../api/src/entities/athlete-share.entity.js';
import { Consent } from '../../api/src/entities/consent.entity.js';
import { Invitation } from '../../api/src/entities/invitation.entity.js';
import { OutboxMessage } from '../../api/src/entities/outbox-message.entity.js';
import { Team } from '../../api/src/entities/team.entity.js';
import { User } from '../../api/src/entities/user.entity.js';
import { addDays, localDate } from '../../api/src/seed/calendar.js';
import { DEMO_ATHLETES, DEMO_PASSWORD, DEMO_STAFF, DEMO_TEAM_NAME } from '../../api/src/seed/demo-team.js';
import { seedDemo, SeedRefusedError } from '../../api/src/seed/seed-demo.js';
import { buildTestApp, signedIn, type TestApp } from './setup/app.js';

let t: TestApp;
const seededAt = new Date('2026-12-01T11:30:00Z');

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
  };
}

beforeAll(async () => {
  t = await buildTestApp();
  await t.reset();
});
afterAll(async () => {
  await t?.reset();
  await t?.close();
});

describe('seedDemo', () => {
  it('refuses in production and writes nothing', async () => {
    await expect(seedDemo(t.dataSource, { appMode: 'production' })).rejects.toBeInstanceOf(SeedRefusedError);
    const previous = process.env.APP_MODE;
    process.env.APP_MODE = 'production';
    try {
      await expect(seedDemo(t.dataSource)).rejects.toThrow(/refused in production/);
    } finally {
      if (previous === undefined) delete process.env.APP_MODE;
      else process.env.APP_MODE = previous;
    }
    expect((await counts()).users).toBe(0);
  });

  it('creates the team once, even when run twice (and twice at once)', async () => {
    const [a, b] = await Promise.all([
      seedDemo(t.dataSource, { appMode: 'test', now: seededAt }),
      seedDemo(t.dataSource, { appMode: 'test', now: seededAt }),
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
    });

    expect(await seedDemo(t.dataSource, { appMode: 'test' })).toEqual({ created: false });
    expect(await counts()).toEqual(first);
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
