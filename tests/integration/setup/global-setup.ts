/**
 * Runs once before the integration files: empties the test database (schemas `public` and
 * `pgboss`) and applies every migration. Files then only truncate tables.
 */
import 'reflect-metadata';
import { createDataSource } from '../../../api/src/db/data-source.js';
import { testConfig } from './config.js';

export async function setup(): Promise<void> {
  const dataSource = createDataSource(testConfig(), { poolSize: 1 });
  await dataSource.initialize();
  try {
    await dataSource.query('DROP SCHEMA IF EXISTS pgboss CASCADE');
    await dataSource.query('DROP SCHEMA IF EXISTS public CASCADE');
    await dataSource.query('CREATE SCHEMA public');
    await dataSource.runMigrations({ transaction: 'each' });
  } finally {
    await dataSource.destroy();
  }
}
