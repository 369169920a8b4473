/**
 * The OpenAPI description against the router it describes: every route the router answers (walked
 * by the same helper as the access table and the fuzz) is in GET /api/openapi.json with its path
 * parameters, query, body and success answer; and real answers of the read routes parse with the
 * response schemas the description was made from.
 */
import type { Request } from 'express';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { z } from 'zod';
import type { User } from '../../api/src/entities/user.entity.js';
import { appRoutes, routeKey, schemaOf, type AppRoute } from '../../api/src/lib/route-table.js';
import { openApiPath } from '../../api/src/openapi/document.js';
import { createAthlete, type CreatedAthlete } from '../factories/athletes.js';
import { FACTORY_PASSWORD } from '../factories/password.js';
import { createCoach } from '../factories/users.js';
import { browser, buildTestApp, signedIn, type TestApp } from './setup/app.js';

const now = new Date('2026-12-01T20:00:00Z');
let t: TestApp;
let coach: User;
let athlete: CreatedAthlete;

beforeAll(async () => {
  t = await buildTestApp({}, { clock: () => now });
  await t.reset();
  coach = await createCoach(t.dataSource);
  athlete = await createAthlete(t.dataSource, { coach, user: { timeZone: 'UTC' } });
});
afterAll(() => t.close());

interface Operation {
  parameters?: { in: string; name: string; required?: boolean }[];
  requestBody?: { content: Record<string, { schema: JsonSchema }> };
  responses: Record<string, { content?: Record<string, { schema: JsonSchema }> }>;
  security?: unknown[];
}
interface JsonSchema {
  $ref?: string;
  properties?: Record<string, unknown>;
}
interface Description {
  openapi: string;
  paths: Record<string, Record<string, Operation>>;
  components: { schemas: Record<string, JsonSchema> };
}

/** The request a date-dependent schema is taken as of (only its clock is read). */
const asOf = { ctx: { clock: () => now } } as unknown as Partial<Request>;
const apiRoutes = () => appRoutes(t.app).filter((r) => r.path.startsWith('/api/'));

/** The keys of an object schema (zod), or null for anything else. */
function keysOf(schema: z.ZodType | undefined): string[] | null {
  const shape = (schema as { shape?: Record<string, unknown> } | undefined)?.shape;
  return shape ? Object.keys(shape).sort() : null;
}

/** A JSON schema's properties, following a component $ref. */
function propertiesOf(doc: Description, schema: JsonSchema): string[] {
  const resolved = schema.$ref ? doc.components.schemas[schema.$ref.split('/').pop()!]! : schema;
  return Object.keys(resolved.properties ?? {}).sort();
}

async function description(): Promise<Description> {
  const agent = await signedIn(t.app, coach.email, FACTORY_PASSWORD);
  const res = await agent.get('/api/openapi.json');
  expect(res.status).toBe(200);
  return res.body as Description;
}

describe('GET /api/openapi.json', () => {
  it('is for signed-in staff only', async () => {
    expect((await browser(t.app).get('/api/openapi.json')).status).toBe(401);
    const own = await signedIn(t.app, athlete.user.email, FACTORY_PASSWORD);
    const refused = await own.get('/api/openapi.json');
    expect(refused.status).toBe(403);
    expect(refused.body.error.code).toBe('forbidden');
    expect((await description()).openapi).toBe('3.1.0');
  });

  it('describes every route of the router with its path, query, body and success answer', async () => {
    const doc = await description();
    const routes = apiRoutes();
    expect(routes.length).toBeGreaterThan(90);
    const described = new Set(
      Object.entries(doc.paths).flatMap(([path, ops]) => Object.keys(ops).map((m) => `${m} ${path}`)),
    );
    // Nothing described that the router does not answer, nothing answered that is not described.
    expect([...described].sort()).toEqual(routes.map((r) => `${r.method} ${openApiPath(r.path)}`).sort());

    for (const r of routes) {
      const key = routeKey(r);
      const op = doc.paths[openApiPath(r.path)]![r.method]!;
      const params = op.parameters ?? [];

      const pathNames = [...r.path.matchAll(/:(\w+)/g)].map((m) => m[1]).sort();
      expect(
        params
          .filter((p) => p.in === 'path')
          .map((p) => p.name)
          .sort(),
        key,
      ).toEqual(pathNames);

      const query = schemaOf(r.schemas.query, asOf);
      expect(
        params
          .filter((p) => p.in === 'query')
          .map((p) => p.name)
          .sort(),
        key,
      ).toEqual(keysOf(query) ?? []);

      const body = schemaOf(r.schemas.body, asOf) ?? r.response?.body?.schema;
      if (body) {
        const content = op.requestBody?.content ?? {};
        const [media] = Object.values(content);
        expect(media?.schema, key).toBeDefined();
        const keys = keysOf(body);
        if (keys) expect(propertiesOf(doc, media!.schema), key).toEqual(keys);
      } else {
        expect(op.requestBody, key).toBeUndefined();
      }

      // The success answer: its status, and for JSON the envelope around the data's shape.
      expect(r.response, `${key} has no responds(…) line`).toBeDefined();
      const spec = r.response!;
      const answer = op.responses[String(spec.status ?? 200)];
      expect(answer, key).toBeDefined();
      if (spec.raw) expect(Object.keys(answer!.content ?? {}), key).toEqual([spec.raw.contentType]);
      else if (spec.data === null) expect(answer!.content, key).toBeUndefined();
      else {
        const schema = answer!.content!['application/json']!.schema;
        if (!spec.bare) expect(propertiesOf(doc, schema), key).toContain('data');
      }
      expect(op.responses.default?.content?.['application/json']?.schema, key).toBeDefined();
      // Routes without authenticate() are marked as needing no session.
      expect(op.security, key).toEqual(r.signedIn ? undefined : []);
    }
  });

  it('describes what the read routes really answer (their bodies parse with the described schemas)', async () => {
    const staff = await signedIn(t.app, coach.email, FACTORY_PASSWORD);
    const checked: string[] = [];
    const reads = apiRoutes().filter(
      (r): r is AppRoute & { response: { data: z.ZodType } } =>
        r.method === 'get' &&
        // Public reads other than the health check need a token from an e-mail.
        (r.signedIn || r.path === '/api/health') &&
        !!r.response?.data &&
        !r.response.raw &&
        !schemaOf(r.schemas.query, asOf) &&
        [...r.path.matchAll(/:(\w+)/g)].every((m) => m[1] === 'athleteId'),
    );
    for (const r of reads) {
      const res = await staff.get(r.path.replace(':athleteId', athlete.athlete.id));
      expect(res.status, routeKey(r)).toBe(200);
      const parsed = r.response.data.safeParse(r.response.bare ? res.body : res.body.data);
      expect(parsed.error?.issues ?? [], routeKey(r)).toEqual([]);
      checked.push(routeKey(r));
    }
    expect(checked).toEqual(
      expect.arrayContaining([
        'GET /api/health',
        'GET /api/openapi.json',
        'GET /api/me',
        'GET /api/roster',
        'GET /api/athletes/:athleteId',
        'GET /api/athletes/:athleteId/plan',
        'GET /api/athletes/:athleteId/cut',
      ]),
    );
  });
});
