import { randomUUID } from 'node:crypto';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { User } from '../../api/src/entities/user.entity.js';
import { createAthlete, type CreatedAthlete } from '../factories/athletes.js';
import { FACTORY_PASSWORD } from '../factories/password.js';
import { createAssistant, createCoach, createOwner } from '../factories/users.js';
import {
  eveningBody,
  fluidBody,
  macroMealBody,
  supplementBody,
  symptomBody,
  weighInBody,
} from './check-ins-helpers.js';
import { planContent, templateBody, versionBody } from './plans-helpers.js';
import { appRoutes, routeKey, type AppRoute } from '../../api/src/lib/route-table.js';
import { browser, buildTestApp, signedIn, type TestApp } from './setup/app.js';

/**
 * Every route of the router (walked from app.router) must be in ACCESS: either public, or with the
 * actors who may not use it on the seeded team's athlete and rows. Each (route × forbidden actor)
 * cell is sent over HTTP with a valid body and must answer 401 (anonymous), 403 or 404 in the
 * error shape, never a 2xx or a 5xx. A new route fails the test until it is listed here.
 */
const now = new Date('2026-12-01T20:00:00Z');
const TODAY = '2026-12-01';

/**
 * anonymous: not signed in; outsider: a coach of another team; otherAthlete: an athlete of the same
 * team who is not the one named; athlete: the named athlete (for staff-only routes); assistant: a
 * staff member of the team the athlete is not shared with.
 */
type Actor = 'anonymous' | 'outsider' | 'otherAthlete' | 'athlete' | 'assistant';
type Cell = 'public' | Actor[];

const SIGNED_IN: Actor[] = ['anonymous'];
/** Rows of one athlete: nobody outside the athlete's circle. */
const ATHLETE_ROWS: Actor[] = ['anonymous', 'outsider', 'otherAthlete', 'assistant'];
/** Staff work on one athlete. */
const STAFF_ON_ATHLETE: Actor[] = [...ATHLETE_ROWS, 'athlete'];
/** Team-wide staff work. */
const TEAM_STAFF: Actor[] = ['anonymous', 'athlete', 'otherAthlete'];
/** Team-wide settings only the owner (or a coach) changes. */
const TEAM_MANAGE: Actor[] = ['anonymous', 'athlete', 'otherAthlete', 'assistant'];

const ACCESS: Record<string, Cell> = {
  'GET /api/health': 'public',
  // The API's description, for staff (and their tools, signed in as them).
  'GET /api/openapi.json': TEAM_STAFF,
  'POST /api/auth/sign-in': 'public',
  'POST /api/auth/sign-out': 'public',
  'POST /api/auth/forgot-password': 'public',
  'POST /api/auth/reset-password': 'public',
  'POST /api/auth/change-password': SIGNED_IN,
  'GET /api/me': SIGNED_IN,
  'PATCH /api/me/settings': SIGNED_IN,
  // Only the user's own sessions: another user's id is answered 404 (tests/integration/sessions.test.ts).
  'GET /api/me/sessions': SIGNED_IN,
  'DELETE /api/me/sessions/:id': SIGNED_IN,
  'POST /api/me/sessions/sign-out-others': SIGNED_IN,
  'GET /api/me/export': SIGNED_IN,
  'POST /api/me/deletion-request': SIGNED_IN,
  'POST /api/me/deletion/confirm': 'public',
  'GET /api/invitations/lookup/:token': 'public',
  'POST /api/invitations/accept': 'public',
  'POST /api/invitations': TEAM_STAFF,
  'GET /api/invitations': TEAM_STAFF,
  'DELETE /api/invitations/:id': ['anonymous', 'athlete', 'outsider'],
  'POST /api/invitations/:id/resend': ['anonymous', 'athlete', 'outsider'],
  'GET /api/roster': TEAM_STAFF,
  'GET /api/review-queue': TEAM_STAFF,
  'POST /api/review-queue/:athleteId/reviewed': STAFF_ON_ATHLETE,
  'GET /api/team/poses': SIGNED_IN,
  'PUT /api/team/poses': TEAM_MANAGE,
  'GET /api/team/members': TEAM_STAFF,
  'GET /api/team/guardrails': TEAM_STAFF,
  'PUT /api/team/guardrails': TEAM_MANAGE,
  'GET /api/team/cut-settings': TEAM_STAFF,
  'PUT /api/team/cut-settings': TEAM_MANAGE,
  'GET /api/athletes/:athleteId': ATHLETE_ROWS,
  'PUT /api/athletes/:athleteId/intake': STAFF_ON_ATHLETE.filter((a) => a !== 'athlete'),
  'PATCH /api/athletes/:athleteId/event': ATHLETE_ROWS,
  'POST /api/athletes/:athleteId/shares': STAFF_ON_ATHLETE,
  'DELETE /api/athletes/:athleteId/shares/:userId': STAFF_ON_ATHLETE,
  'GET /api/athletes/:athleteId/days': ATHLETE_ROWS,
  'GET /api/athletes/:athleteId/days/:date': ATHLETE_ROWS,
  'PUT /api/athletes/:athleteId/days/:date/weigh-in': ATHLETE_ROWS,
  'DELETE /api/athletes/:athleteId/days/:date/weigh-in': ATHLETE_ROWS,
  'PUT /api/athletes/:athleteId/days/:date/evening': ATHLETE_ROWS,
  'DELETE /api/athletes/:athleteId/days/:date/evening': ATHLETE_ROWS,
  'POST /api/athletes/:athleteId/days/:date/fluids': ATHLETE_ROWS,
  'PATCH /api/athletes/:athleteId/fluids/:entryId': ATHLETE_ROWS,
  'DELETE /api/athletes/:athleteId/fluids/:entryId': ATHLETE_ROWS,
  'POST /api/athletes/:athleteId/days/:date/meals': ATHLETE_ROWS,
  'PATCH /api/athletes/:athleteId/meals/:entryId': ATHLETE_ROWS,
  'DELETE /api/athletes/:athleteId/meals/:entryId': ATHLETE_ROWS,
  'POST /api/athletes/:athleteId/days/:date/supplements': ATHLETE_ROWS,
  'PATCH /api/athletes/:athleteId/supplements/:entryId': ATHLETE_ROWS,
  'DELETE /api/athletes/:athleteId/supplements/:entryId': ATHLETE_ROWS,
  'POST /api/athletes/:athleteId/days/:date/symptoms': ATHLETE_ROWS,
  'PATCH /api/athletes/:athleteId/symptoms/:entryId': ATHLETE_ROWS,
  'DELETE /api/athletes/:athleteId/symptoms/:entryId': ATHLETE_ROWS,
  'GET /api/athletes/:athleteId/plan': ATHLETE_ROWS,
  'GET /api/athletes/:athleteId/plan/versions/:versionId': ATHLETE_ROWS,
  'POST /api/athletes/:athleteId/plan/check': STAFF_ON_ATHLETE,
  'POST /api/athletes/:athleteId/plan/versions': STAFF_ON_ATHLETE,
  'POST /api/athletes/:athleteId/plan/countdown': STAFF_ON_ATHLETE,
  'POST /api/athletes/:athleteId/plan/countdown/move': STAFF_ON_ATHLETE,
  'GET /api/athletes/:athleteId/trend': ATHLETE_ROWS,
  'GET /api/athletes/:athleteId/cut': ATHLETE_ROWS,
  'PUT /api/athletes/:athleteId/weigh-in': STAFF_ON_ATHLETE,
  'POST /api/athletes/:athleteId/cut-plans': STAFF_ON_ATHLETE,
  // The athlete writes rehearsal day notes too (the athlete policy's noteRehearsal).
  'PUT /api/athletes/:athleteId/cut-plans/:cutPlanId/note': ATHLETE_ROWS,
  'GET /api/athletes/:athleteId/body-composition': ATHLETE_ROWS,
  'POST /api/athletes/:athleteId/body-measurements': ATHLETE_ROWS,
  'DELETE /api/athletes/:athleteId/body-measurements/:measurementId': ATHLETE_ROWS,
  'GET /api/athletes/:athleteId/days.csv': ATHLETE_ROWS,
  'POST /api/athletes/:athleteId/end-coaching': STAFF_ON_ATHLETE,
  'GET /api/countdown-templates': TEAM_STAFF,
  'POST /api/countdown-templates': TEAM_STAFF,
  'GET /api/countdown-templates/:templateId': [...TEAM_STAFF, 'outsider'],
  'PUT /api/countdown-templates/:templateId': [...TEAM_STAFF, 'outsider'],
  'DELETE /api/countdown-templates/:templateId': [...TEAM_STAFF, 'outsider'],
  'GET /api/foods': SIGNED_IN,
  'POST /api/foods': TEAM_STAFF,
  'POST /api/foods/label': TEAM_STAFF,
  // `foodId` is the named athlete's personal food: only the athlete and the staff who read them.
  'GET /api/foods/:foodId': ATHLETE_ROWS,
  // Personal foods are added by the athlete alone (a coach is refused in food-labels.test.ts).
  'POST /api/athletes/:athleteId/foods': ATHLETE_ROWS,
  'POST /api/athletes/:athleteId/foods/barcode': ATHLETE_ROWS,
  'POST /api/meal-plans/fit': TEAM_MANAGE,
  'POST /api/athletes/:athleteId/days/:date/planned-meals/:mealId': ATHLETE_ROWS,
  'POST /api/athletes/:athleteId/photos': ATHLETE_ROWS,
  'GET /api/athletes/:athleteId/photos': ATHLETE_ROWS,
  'GET /api/photos/:photoId/:size': ATHLETE_ROWS,
  'DELETE /api/photos/:photoId': ATHLETE_ROWS,
  'GET /api/athletes/:athleteId/marks': ATHLETE_ROWS,
  'POST /api/athletes/:athleteId/marks': STAFF_ON_ATHLETE,
  'PATCH /api/marks/:markId': STAFF_ON_ATHLETE,
  'DELETE /api/marks/:markId': STAFF_ON_ATHLETE,
  'POST /api/marks/:markId/replies': ATHLETE_ROWS,
  'POST /api/marks/:markId/read': ATHLETE_ROWS,
  'GET /api/athletes/:athleteId/weekly-check-ins': ATHLETE_ROWS,
  'GET /api/athletes/:athleteId/weekly-check-ins/current': ATHLETE_ROWS,
  'GET /api/athletes/:athleteId/weekly-check-ins/week/:dueDate': ATHLETE_ROWS,
  'POST /api/athletes/:athleteId/weekly-check-ins': STAFF_ON_ATHLETE.filter((a) => a !== 'athlete'),
  'GET /api/weekly-check-ins/:checkInId': ATHLETE_ROWS,
  'POST /api/weekly-check-ins/:checkInId/reply': STAFF_ON_ATHLETE,
  'PATCH /api/athletes/:athleteId/check-in-day': STAFF_ON_ATHLETE,
  'GET /api/team/check-in-questions': SIGNED_IN,
  'PUT /api/team/check-in-questions': TEAM_MANAGE,
  'GET /api/me/notifications': SIGNED_IN,
  'PUT /api/me/notifications': SIGNED_IN,
  'GET /api/unsubscribe': 'public',
  'POST /api/unsubscribe': 'public',
};

interface World {
  athlete: CreatedAthlete;
  assistantUser: User;
  ids: Record<string, string>;
  agents: Record<Exclude<Actor, 'anonymous'>, ReturnType<typeof browser>> & {
    anonymous: ReturnType<typeof browser>;
  };
}

/** A 7-site skinfold measurement (every site, so it suits either sex). */
const measurementBody = {
  date: TODAY,
  method: 'skinfold_7',
  skinfoldsMm: {
    chest: 8,
    midaxillary: 10,
    triceps: 12,
    subscapular: 14,
    abdomen: 20,
    suprailiac: 15,
    thigh: 18,
  },
  measuredBy: 'Coach',
};

/** A nutrition label, per 100 g. */
const labelBody = {
  name: 'Access crackers',
  basis: 'per100g',
  energy: 400,
  energyUnit: 'kcal',
  proteinG: 10,
  carbohydrateG: 70,
  fatG: 9,
};

let t: TestApp;
let routes: AppRoute[];
let w: World;

beforeAll(async () => {
  t = await buildTestApp({}, { clock: () => now });
  await t.reset();
  const owner = await createOwner(t.dataSource);
  const coach = await createCoach(t.dataSource, { teamId: owner.teamId });
  const assistantUser = await createAssistant(t.dataSource, { teamId: owner.teamId });
  const athlete = await createAthlete(t.dataSource, { coach });
  const otherAthlete = await createAthlete(t.dataSource, { coach });
  const outsiderOwner = await createOwner(t.dataSource);
  const outsider = await createCoach(t.dataSource, { teamId: outsiderOwner.teamId });
  const as = (u: User) => signedIn(t.app, u.email, FACTORY_PASSWORD);
  const coachAgent = await as(coach);
  const self = await as(athlete.user);
  const a = `/api/athletes/${athlete.athlete.id}`;
  const fluid = await self.post(`${a}/days/${TODAY}/fluids`).send(fluidBody());
  const meal = await self.post(`${a}/days/${TODAY}/meals`).send(macroMealBody());
  const supplement = await self.post(`${a}/days/${TODAY}/supplements`).send(supplementBody());
  const symptom = await self.post(`${a}/days/${TODAY}/symptoms`).send(symptomBody(['dizziness']));
  const mark = await coachAgent
    .post(`${a}/marks`)
    .send({ metric: 'weight', fromDate: TODAY, toDate: TODAY, note: 'Access mark' });
  const template = await coachAgent.post('/api/countdown-templates').send(templateBody());
  const version = await coachAgent.post(`${a}/plan/versions`).send(versionBody(TODAY, planContent()));
  const measurement = await coachAgent.post(`${a}/body-measurements`).send(measurementBody);
  const personalFood = await self.post(`${a}/foods`).send(labelBody);
  const invitation = await coachAgent
    .post('/api/invitations')
    .send({ email: 'invitee@example.test', name: 'Invitee', role: 'athlete' });
  w = {
    athlete,
    assistantUser,
    ids: {
      athleteId: athlete.athlete.id,
      markId: mark.body.data.id,
      measurementId: measurement.body.data?.id ?? randomUUID(),
      foodId: personalFood.body.data?.food?.id ?? randomUUID(),
      templateId: template.body.data.id,
      versionId: version.body.data?.id ?? version.body.data?.version?.id ?? randomUUID(),
      id: invitation.body.data?.id ?? randomUUID(),
      userId: assistantUser.id,
      date: TODAY,
      dueDate: TODAY,
      size: 'thumb',
      photoId: randomUUID(),
      checkInId: randomUUID(),
      token: 'x'.repeat(40),
    },
    agents: {
      anonymous: browser(t.app),
      outsider: await as(outsider),
      otherAthlete: await as(otherAthlete.user),
      athlete: self,
      assistant: await as(assistantUser),
    },
  };
  entryIds = {
    fluids: fluid.body.data.id,
    meals: meal.body.data.id,
    supplements: supplement.body.data.id,
    symptoms: symptom.body.data.id,
  };
  routes = appRoutes(t.app);
}, 120_000);
afterAll(() => t.close());

let entryIds: Record<string, string>;

/** A valid body for each route that takes one, so a refusal is about the actor, not the input. */
function bodyFor(key: string): object | undefined {
  const bodies: Record<string, object> = {
    'POST /api/auth/change-password': {
      currentPassword: FACTORY_PASSWORD,
      newPassword: 'another-password-2',
    },
    'PATCH /api/me/settings': { name: 'Renamed' },
    'POST /api/invitations': { email: 'someone@example.test', name: 'Someone', role: 'athlete' },
    'PUT /api/team/poses': { poses: ['Front double biceps'] },
    'PUT /api/team/guardrails': {
      energyKcal: { female: 1200, male: 1500 },
      waterMl: { female: 1500, male: 2000 },
    },
    'PUT /api/athletes/:athleteId/intake': {
      sex: 'female',
      birthDate: '1996-04-12',
      heightCm: 165,
      currentWeightKg: 60,
      usualWaterMl: 3000,
      usualEnergyKcal: 2100,
      goal: 'lose',
      eventType: 'show',
      eventDate: '2027-03-14',
      eventTime: '09:30',
      eventTimeZone: 'Europe/Lisbon',
      timeZone: 'Europe/Lisbon',
      weightUnit: 'kg',
      volumeUnit: 'ml',
      photoConsent: true,
      safetyAcknowledged: true,
    },
    'PATCH /api/athletes/:athleteId/event': { eventDate: '2027-03-14' },
    'PUT /api/team/cut-settings': { acuteSharePct: 5 },
    'PUT /api/athletes/:athleteId/weigh-in': {
      weighInLimitKg: 63,
      weighInTiming: 'day_before',
      weighInTime: '18:00',
      competitionTime: '10:00',
      usualWeightKg: 66,
      classBelowKg: 57,
      classAboveKg: 70,
    },
    'POST /api/athletes/:athleteId/cut-plans': {
      startDate: TODAY,
      startKg: 66,
      preAcuteKg: 65,
      acuteDays: 2,
      path: 'linear',
      notes: null,
      acknowledgedKeys: [],
    },
    'PUT /api/athletes/:athleteId/cut-plans/:cutPlanId/note': { date: TODAY, note: 'Low-residue food' },
    'POST /api/athletes/:athleteId/shares': { userId: w.assistantUser.id },
    'PUT /api/athletes/:athleteId/days/:date/weigh-in': weighInBody(),
    'PUT /api/athletes/:athleteId/days/:date/evening': eveningBody(),
    'POST /api/athletes/:athleteId/days/:date/fluids': fluidBody(),
    'PATCH /api/athletes/:athleteId/fluids/:entryId': { volume: 100 },
    'POST /api/athletes/:athleteId/days/:date/meals': macroMealBody(),
    'PATCH /api/athletes/:athleteId/meals/:entryId': { proteinG: 1 },
    'POST /api/athletes/:athleteId/days/:date/supplements': supplementBody(),
    'PATCH /api/athletes/:athleteId/supplements/:entryId': { dose: 1 },
    'POST /api/athletes/:athleteId/days/:date/symptoms': symptomBody(['fainting']),
    'PATCH /api/athletes/:athleteId/symptoms/:entryId': { note: 'x' },
    'POST /api/athletes/:athleteId/plan/check': { content: planContent() },
    'POST /api/athletes/:athleteId/plan/versions': versionBody(TODAY, planContent()),
    'POST /api/athletes/:athleteId/plan/countdown': {
      templateId: w.ids.templateId,
      eventDate: '2027-03-14',
      preview: true,
    },
    'POST /api/athletes/:athleteId/plan/countdown/move': { eventDate: '2027-03-14', preview: true },
    'POST /api/countdown-templates': templateBody(),
    'PUT /api/countdown-templates/:templateId': templateBody(),
    'POST /api/foods': { name: 'Test oats', proteinG: 13, carbohydrateG: 60, fatG: 7 },
    'POST /api/foods/label': labelBody,
    'POST /api/athletes/:athleteId/foods': labelBody,
    'POST /api/athletes/:athleteId/foods/barcode': { barcode: '2004821000018' },
    'POST /api/meal-plans/fit': {
      targets: { energyKcal: 500, proteinG: null, carbohydrateG: null, fatG: null },
      tolerances: { energyPct: 5, proteinG: 10, carbohydrateG: 15, fatG: 7 },
      meals: [{ id: randomUUID(), foods: [{ foodId: 'ifct:A015' }] }],
    },
    'POST /api/athletes/:athleteId/days/:date/planned-meals/:mealId': { clientId: randomUUID() },
    'POST /api/athletes/:athleteId/marks': { metric: 'weight', fromDate: TODAY, toDate: TODAY, note: 'Note' },
    'PATCH /api/marks/:markId': { note: 'Edited' },
    'POST /api/marks/:markId/replies': { body: 'Reply' },
    'POST /api/athletes/:athleteId/weekly-check-ins': {
      dueDate: TODAY,
      answers: [],
      questionsForCoach: null,
    },
    'POST /api/weekly-check-ins/:checkInId/reply': { body: 'Reply' },
    'PATCH /api/athletes/:athleteId/check-in-day': { weekday: 'mon' },
    'POST /api/athletes/:athleteId/body-measurements': measurementBody,
    'PUT /api/team/check-in-questions': { questions: [] },
    'PUT /api/me/notifications': { enabled: {}, reminderHour: null },
  };
  return bodies[key];
}

function pathFor(route: AppRoute): string {
  return route.path.replace(/:(\w+)/g, (_m, name: string) => {
    if (name === 'entryId') {
      const kind = /\/(fluids|meals|supplements|symptoms)\/:entryId/.exec(route.path)?.[1] ?? 'fluids';
      return entryIds[kind] ?? randomUUID();
    }
    return w.ids[name] ?? randomUUID();
  });
}

describe('route access table', () => {
  it('lists every route of the router, and only those', () => {
    const keys = routes.map(routeKey).sort();
    expect(
      keys.filter((k) => !(k in ACCESS)),
      'routes missing from ACCESS',
    ).toEqual([]);
    expect(
      Object.keys(ACCESS).filter((k) => !keys.includes(k)),
      'ACCESS rows with no route',
    ).toEqual([]);
  });

  it('refuses every forbidden actor on every route, over HTTP, without a 5xx', async () => {
    const leaks: string[] = [];
    let cells = 0;
    for (const route of routes) {
      const key = routeKey(route);
      const cell = ACCESS[key];
      if (!cell || cell === 'public') continue;
      for (const actor of cell) {
        cells++;
        // Date ranges where a route needs one (a missing range would be refused before the actor).
        let req = w.agents[actor][route.method](pathFor(route)).query(
          route.schemas.query ? { from: '2026-11-01', to: TODAY } : {},
        );
        const body = bodyFor(key);
        if (route.method !== 'get') req = req.send(body ?? {});
        const res = await req;
        const allowed = actor === 'anonymous' ? [401] : [403, 404];
        if (!allowed.includes(res.status) || typeof res.body?.error?.code !== 'string') {
          leaks.push(`${key} as ${actor}: ${res.status} ${JSON.stringify(res.body).slice(0, 200)}`);
        }
      }
    }
    console.info(`route access: ${routes.length} routes, ${cells} forbidden cells exercised`);
    expect(leaks).toEqual([]);
  }, 120_000);
});
