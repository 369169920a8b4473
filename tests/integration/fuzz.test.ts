import { randomUUID } from 'node:crypto';
import fc from 'fast-check';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { z } from 'zod';
import { createAthlete } from '../factories/athletes.js';
import { FACTORY_PASSWORD } from '../factories/password.js';
import { createCoach, createOwner } from '../factories/users.js';
import { fluidBody } from './check-ins-helpers.js';
import { templateBody } from './plans-helpers.js';
import { startFoodProductsFake, type FoodProductsFake } from '../../scripts/src/lib/food-products-fake.js';
import { appRoutes, routeKey, schemaOf, type AppRoute } from '../../api/src/lib/route-table.js';
import { browser, buildTestApp, signedIn, type TestApp } from './setup/app.js';

/**
 * Property-based fuzz of every route of the router (walked from app.router, not listed by hand):
 * bodies generated from the route's own shared schemas (kept on its `validate` handler), arbitrary
 * JSON, strings with control characters, odd dates and ids in paths and queries, sent as an owner,
 * a coach and an athlete of one small team. Never a 5xx; every 4xx has the error shape.
 * FUZZ_RUNS sets the cases per route (200 here, 2,000 with `npm run test:fuzz`).
 */
const RUNS = Number(process.env.FUZZ_RUNS ?? 200);
const now = new Date('2026-12-01T20:00:00Z');
const TODAY = '2026-12-01';

type Agent = ReturnType<typeof browser>;
type Role = 'owner' | 'coach' | 'athlete';

let t: TestApp;
/** The barcode route asks it (a lookup the fuzz reaches with a valid check digit). */
let foodProducts: FoodProductsFake;
const signIn = (email: string): Promise<Agent> => signedIn(t.app, email, FACTORY_PASSWORD);
let routes: AppRoute[];
const emails = {} as Record<Role, string>;
const agents = {} as Record<Role, Agent>;
/** Real ids by path parameter name, so generated paths reach past the 404s. */
const ids: Record<string, string[]> = {};
/** Cases sent and 5xx seen, for the closing line. */
let sent = 0;
const serverErrors: string[] = [];

beforeAll(async () => {
  foodProducts = await startFoodProductsFake({ port: 0 });
  t = await buildTestApp({ foodProductsUrl: foodProducts.url }, { clock: () => now });
  await t.reset();
  const owner = await createOwner(t.dataSource);
  const coach = await createCoach(t.dataSource, { teamId: owner.teamId });
  const athlete = await createAthlete(t.dataSource, { coach });
  emails.owner = owner.email;
  emails.coach = coach.email;
  emails.athlete = athlete.user.email;
  for (const role of ['owner', 'coach', 'athlete'] as const) {
    agents[role] = await signIn(emails[role]);
  }
  const a = `/api/athletes/${athlete.athlete.id}`;
  const fluid = await agents.athlete.post(`${a}/days/${TODAY}/fluids`).send(fluidBody());
  const mark = await agents.coach
    .post(`${a}/marks`)
    .send({ metric: 'weight', fromDate: TODAY, toDate: TODAY, note: 'Fuzz mark' });
  const template = await agents.coach.post('/api/countdown-templates').send(templateBody());
  ids.athleteId = [athlete.athlete.id];
  ids.entryId = [fluid.body.data?.id ?? randomUUID()];
  ids.markId = [mark.body.data?.id ?? randomUUID()];
  ids.templateId = [template.body.data?.id ?? randomUUID()];
  ids.userId = [coach.id, owner.id, athlete.user.id];
  ids.id = [randomUUID()];
  // Destructive routes last, so the ones before them see the seeded rows.
  const last = (r: AppRoute) =>
    r.method === 'delete' || /sign-out|end-coaching|deletion|change-password/.test(r.path) ? 1 : 0;
  routes = appRoutes(t.app).sort((x, y) => last(x) - last(y));
}, 120_000);

afterAll(async () => {
  console.info(
    `fuzz: ${routes.length} routes, ${sent} cases (${RUNS} per route), ${serverErrors.length} answers 5xx`,
  );
  await t.close();
  await foodProducts.close();
});

// ----------------------------------------------------------------------------------------------
// Generators

/** Characters that break naive handling: NUL and other controls, combining marks, astral, lone surrogates. */
const nastyChar = fc.constantFrom(
  '\u0000',
  '\u0001',
  '\u0007',
  '\u001b',
  '\u007f',
  '\u0085',
  '\u2028',
  '\ud800',
  '\udfff',
  'e\u0301',
  '𝒳',
  '\t',
  '\n',
  '\r',
  '%',
  '/',
  '\\',
  '"',
  "'",
  '<',
  ' ',
  'a',
  '0',
  '-',
  ':',
);
const nastyString = fc.oneof(
  fc.string({ unit: nastyChar, maxLength: 12 }),
  fc.string({ maxLength: 12 }),
  fc.constant(''),
  fc.constant('x'.repeat(2500)),
);
/** Values a field is likely to look for, right and nearly right. */
const likelyString = (): fc.Arbitrary<string> =>
  fc.constantFrom(
    TODAY,
    '2026-11-30',
    '0000-01-01',
    '0001-01-01',
    '9999-12-31',
    '2026-02-30',
    '2026-12-01T00:00:00Z',
    '08:00',
    '24:00',
    'UTC',
    'Europe/Lisbon',
    'SST',
    'US/Pacific-New',
    'nobody@example.test',
    'kg',
    'ml',
    'water',
    'macros',
    'show',
    'weight',
    '00000000-0000-0000-0000-000000000000',
    ...Object.values(ids).flat(),
  );
const anyString = (): fc.Arbitrary<string> => fc.oneof(likelyString(), nastyString);
const anyNumber = fc.oneof(
  fc.integer({ min: -10, max: 10 }),
  fc.integer(),
  fc.double({ noNaN: true, noDefaultInfinity: true }),
  fc.constantFrom(0, 1, 60, 500, 1e308, -1e308, Number.MAX_SAFE_INTEGER + 2),
);
const json = (): fc.Arbitrary<unknown> =>
  fc.letrec<{ v: unknown }>((tie) => ({
    v: fc.oneof(
      { depthSize: 'small', withCrossShrink: true },
      anyString(),
      anyNumber,
      fc.boolean(),
      fc.constant(null),
      fc.array(tie('v'), { maxLength: 3 }),
      fc.dictionary(anyString(), tie('v'), { maxKeys: 3 }),
    ),
  })).v;

interface Def {
  type: string;
  shape?: Record<string, z.ZodType>;
  innerType?: z.ZodType;
  element?: z.ZodType;
  options?: z.ZodType[];
  entries?: Record<string, unknown>;
  values?: unknown[];
  in?: z.ZodType;
  valueType?: z.ZodType;
}
const defOf = (s: z.ZodType): Def => (s as unknown as { _zod: { def: Def } })._zod.def;

/** Values shaped like `schema`, with any leaf sometimes replaced by something hostile. */
function fromSchema(schema: z.ZodType, depth = 0): fc.Arbitrary<unknown> {
  const def = defOf(schema);
  const wild = depth > 4 ? fc.constant(null) : json();
  const shaped = ((): fc.Arbitrary<unknown> => {
    switch (def.type) {
      case 'object': {
        const shape = def.shape ?? {};
        const keys = Object.fromEntries(Object.entries(shape).map(([k, v]) => [k, fromSchema(v, depth + 1)]));
        return fc.record(keys, { requiredKeys: Object.keys(shape).filter(() => true) }).chain((full) =>
          // Now and then a key is left out.
          fc.subarray(Object.keys(full)).map((kept) => Object.fromEntries(kept.map((k) => [k, full[k]]))),
        );
      }
      case 'string':
        return anyString();
      case 'number':
      case 'int':
        return anyNumber;
      case 'boolean':
        return fc.boolean();
      case 'enum':
        return fc.constantFrom(...Object.values(def.entries ?? { x: 'x' }));
      case 'literal':
        return fc.constantFrom(...(def.values ?? [null]));
      case 'array':
        return def.element ? fc.array(fromSchema(def.element, depth + 1), { maxLength: 3 }) : wild;
      case 'nullable':
      case 'optional':
        return def.innerType
          ? fc.oneof(fc.constant(null), fc.constant(undefined), fromSchema(def.innerType, depth + 1))
          : wild;
      case 'default':
      case 'prefault':
      case 'readonly':
      case 'catch':
        return def.innerType ? fromSchema(def.innerType, depth + 1) : wild;
      case 'union':
        return def.options?.length ? fc.oneof(...def.options.map((o) => fromSchema(o, depth + 1))) : wild;
      case 'pipe':
        return def.in ? fromSchema(def.in, depth + 1) : wild;
      case 'record':
        return def.valueType
          ? fc.dictionary(anyString(), fromSchema(def.valueType, depth + 1), { maxKeys: 3 })
          : wild;
      default:
        return wild;
    }
  })();
  return fc.oneof({ arbitrary: shaped, weight: 5 }, { arbitrary: wild, weight: 1 });
}

/** Every byte of the UTF-8 form percent-encoded (a lone surrogate becomes U+FFFD, as a browser sends it). */
const percentEncode = (v: string): string =>
  [...Buffer.from(v, 'utf8')].map((b) => `%${b.toString(16).padStart(2, '0').toUpperCase()}`).join('');

/** A path with each `:param` filled by a real id, a plausible value or garbage (URL-encoded). */
function pathArb(path: string): fc.Arbitrary<string> {
  const parts = path.split('/').map((seg) => {
    if (!seg.startsWith(':')) return fc.constant(seg);
    const name = seg.slice(1);
    const real = ids[name] ?? [];
    const value = fc
      .oneof(
        { arbitrary: real.length ? fc.constantFrom(...real) : likelyString(), weight: 3 },
        { arbitrary: anyString(), weight: 2 },
        { arbitrary: fc.constantFrom('thumb', 'display', TODAY, '0000-01-01', '9999-12-31'), weight: 1 },
      )
      // Short enough to stay under Node's header limit (a 431 from Node itself, before the app).
      .map((v) => (v === '' ? 'x' : percentEncode(v.slice(0, 300))));
    // Now and then a raw, malformed or NUL escape.
    return fc.oneof(
      { arbitrary: value, weight: 9 },
      { arbitrary: fc.constantFrom('%', '%ZZ', '%00', '%C0%AF', '..'), weight: 1 },
    );
  });
  return fc.tuple(...parts).map((segs) => segs.join('/'));
}

/** A query from the route's schema keys (sometimes repeated) plus stray keys. */
function queryArb(route: AppRoute): fc.Arbitrary<Record<string, string | string[]>> {
  const schema = schemaOf(route.schemas.query, { ctx: { clock: () => now } } as never);
  const shape = schema ? (defOf(schema).shape ?? defOf(defOf(schema).in ?? schema).shape ?? {}) : {};
  const keys = [...Object.keys(shape), 'from', 'to', 'q', 'token'];
  const one = anyString().map((v) => v.slice(0, 300));
  const value = fc.oneof(
    { arbitrary: one, weight: 4 },
    { arbitrary: fc.array(one, { minLength: 2, maxLength: 2 }), weight: 1 },
  );
  return fc.dictionary(fc.constantFrom(...keys), value, { maxKeys: keys.length });
}

function bodyArb(route: AppRoute): fc.Arbitrary<unknown> {
  const schema = schemaOf(route.schemas.body, { ctx: { clock: () => now } } as never);
  return fc.oneof(
    { arbitrary: schema ? fromSchema(schema) : json(), weight: 6 },
    { arbitrary: json(), weight: 2 },
    { arbitrary: fc.dictionary(nastyString, nastyString, { maxKeys: 3 }), weight: 1 },
  );
}

// ----------------------------------------------------------------------------------------------

async function stillSignedIn(): Promise<void> {
  for (const role of ['owner', 'coach', 'athlete'] as const) {
    const me = await agents[role].get('/api/me');
    if (me.status !== 200) agents[role] = await signIn(emails[role]);
  }
}

describe('fuzz: every route of the router', () => {
  it('enumerates the routes from the router', () => {
    expect(routes.length).toBeGreaterThan(80);
  });

  it(
    'answers hostile and careless input with a 4xx in the error shape, never a 5xx',
    async () => {
      for (const route of routes) {
        const arb = fc.record({
          role: fc.constantFrom<Role>('owner', 'coach', 'athlete'),
          path: pathArb(route.path),
          query: queryArb(route),
          body: bodyArb(route),
        });
        await fc.assert(
          fc.asyncProperty(arb, async ({ role, path, query, body }) => {
            sent++;
            let req = agents[role][route.method](path).query(query);
            if (route.method !== 'get') {
              // Serialised here: any JSON value, scalars too, as a careless client would send it.
              req = req.set('Content-Type', 'application/json').send(JSON.stringify(body ?? {}));
            }
            const res = await req;
            const where = `${routeKey(route)} as ${role}: ${res.status} ${path}`;
            if (res.status >= 500) serverErrors.push(where);
            expect(res.status, where).toBeLessThan(500);
            if (res.status >= 400) {
              expect(res.body?.error, where).toMatchObject({
                code: expect.any(String),
                message: expect.any(String),
                requestId: expect.any(String),
              });
            }
          }),
          { numRuns: RUNS, endOnFailure: true },
        );
        await stillSignedIn();
      }
      expect(serverErrors).toEqual([]);
    },
    Math.max(600_000, RUNS * 1500),
  );
});
