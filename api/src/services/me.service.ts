import type { Me, UpdateSettingsRequest } from '@driftmark/shared';
import type { EntityManager } from 'typeorm';
import type { User } from '../entities/user.entity.js';
import { notFound } from '../errors.js';
import { presentMe } from '../presenters/me.presenter.js';
import { AthleteRepository } from '../repositories/athlete.repository.js';
import { TeamRepository } from '../repositories/team.repository.js';
import { UserRepository } from '../repositories/user.repository.js';

/** The signed-in user's own account: `GET /api/me` and settings. */
export class MeService {
  constructor(private readonly manager: EntityManager) {}

  /** The Me body for a user already loaded. */
  async describe(user: User, manager: EntityManager = this.manager): Promise<Me> {
    const [team, athlete] = await Promise.all([
      new TeamRepository(manager).findById(user.teamId),
      user.role === 'athlete' ? new AthleteRepository(manager).findByUserId(user.id) : Promise.resolve(null),
    ]);
    if (!team) throw new Error(`User ${user.id} has no team ${user.teamId}`);
    return presentMe(user, team, athlete);
  }

  async get(userId: string): Promise<Me> {
    const user = await new UserRepository(this.manager).findById(userId);
    if (!user) throw notFound();
    return this.describe(user);
  }

  async updateSettings(userId: string, input: UpdateSettingsRequest): Promise<Me> {
    const users = new UserRepository(this.manager);
    await users.update(userId, {
      ...(input.name !== undefined ? { name: input.name } : {}),
      ...(input.timeZone !== undefined ? { timeZone: input.timeZone } : {}),
      ...(input.weightUnit !== undefined ? { weightUnit: input.weightUnit } : {}),
      ...(input.volumeUnit !== undefined ? { volumeUnit: input.volumeUnit } : {}),
    });
    return this.get(userId);
  }
}
