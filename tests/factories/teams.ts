import type { DataSource } from 'typeorm';
import { Team } from '../../api/src/entities/team.entity.js';

let seq = 0;

export function buildTeam(overrides: Partial<Team> = {}): Partial<Team> {
  seq += 1;
  return { name: `Test Team ${seq}`, settings: {}, ...overrides };
}

export async function createTeam(db: DataSource, overrides: Partial<Team> = {}): Promise<Team> {
  return db.getRepository(Team).save(db.getRepository(Team).create(buildTeam(overrides)));
}
