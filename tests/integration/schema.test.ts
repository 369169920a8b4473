import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { buildTestApp, type TestApp } from './setup/app.js';

let t: TestApp;
beforeAll(async () => {
  t = await buildTestApp();
});
afterAll(() => t.close());

describe('migrations vs entities', () => {
  it('leaves nothing for the schema builder to change', async () => {
    const sql = await t.dataSource.driver.createSchemaBuilder().log();
    expect(sql.upQueries.map((q) => q.query)).toEqual([]);
  });

  it('has run every migration', async () => {
    expect(await t.dataSource.showMigrations()).toBe(false);
  });
});
