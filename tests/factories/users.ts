import type { Role } from '@driftmark/shared';
import type { DataSource } from 'typeorm';
import type { Team } from '../../api/src/entities/team.entity.js';
import { User } from '../../api/src/entities/user.entity.js';
import { FACTORY_PASSWORD_HASH } from './password.js';
import { createTeam } from './teams.js';

let seq = 0;

export type UserOverrides = Partial<Omit<User, 'team'>> & { team?: Team };

export function buildUser(overrides: Partial<User> = {}): Partial<User> {
  seq += 1;
  const role: Role = overrides.role ?? 'coach';
  return {
    email: `${role}-${seq}-${Math.random().toString(36).slice(2, 8)}@example.test`,
    name: `${role[0]!.toUpperCase()}${role.slice(1)} ${seq}`,
    role,
    passwordHash: FACTORY_PASSWORD_HASH,
    timeZone: 'UTC',
    weightUnit: 'kg',
    volumeUnit: 'ml',
    ...overrides,
  };
}

/** Saves a user; creates a team for them unless `team` or `teamId` is given. */
export async function createUser(db: DataSource, overrides: UserOverrides = {}): Promise<User> {
  const { team, ...rest } = overrides;
  const teamId = rest.teamId ?? team?.id ?? (await createTeam(db)).id;
  const repo = db.getRepository(User);
  return repo.save(repo.create(buildUser({ ...rest, teamId })));
}

/** A team with its owner (head coach). */
export async function createOwner(db: DataSource, overrides: UserOverrides = {}): Promise<User> {
  return createUser(db, { ...overrides, role: 'owner' });
}

export async function createCoach(db: DataSource, overrides: UserOverrides = {}): Promise<User> {
  return createUser(db, { ...overrides, role: 'coach' });
}

export async function createAssistant(db: DataSource, overrides: UserOverrides = {}): Promise<User> {
  return createUser(db, { ...overrides, role: 'assistant' });
}
