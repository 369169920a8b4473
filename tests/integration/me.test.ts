import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createAthlete } from '../factories/athletes.js';
import { FACTORY_PASSWORD } from '../factories/password.js';
import { createAssistant, createCoach, createOwner } from '../factories/users.js';
import { buildTestApp, signedIn, type TestApp } from './setup/app.js';

let t: TestApp;
beforeAll(async () => {
  t = await buildTestApp();
  await t.reset();
});
afterAll(() => t.close());

describe('GET /api/me abilities', () => {
  it('tells each role what it may invite and whether it manages the team', async () => {
    const owner = await createOwner(t.dataSource);
    const coach = await createCoach(t.dataSource, { teamId: owner.teamId });
    const assistant = await createAssistant(t.dataSource, { teamId: owner.teamId });
    const athlete = await createAthlete(t.dataSource, { coach });

    const expected = [
      [owner.email, ['athlete', 'coach', 'assistant'], true],
      [coach.email, ['athlete'], false],
      [assistant.email, [], false],
      [athlete.user.email, [], false],
    ] as const;
    for (const [email, invite, manageTeam] of expected) {
      const agent = await signedIn(t.app, email, FACTORY_PASSWORD);
      const me = await agent.get('/api/me').expect(200);
      expect(me.body.data.abilities, email).toEqual({ invite, manageTeam });
    }
  });
});
