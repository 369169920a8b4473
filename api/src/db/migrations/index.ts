import type { MigrationInterface } from 'typeorm';
import { InitialSchema1796162777444 } from './1796162777444-InitialSchema.js';

/** Every migration in order, imported explicitly (a glob fails under vitest and in dist). */
export const MIGRATIONS: (new () => MigrationInterface)[] = [InitialSchema1796162777444];
