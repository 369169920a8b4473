import { In, type EntityManager } from 'typeorm';
import { STAFF_ROLES, type Role } from '@driftmark/shared';
import { User } from '../entities/user.entity.js';

export type NewUser = Pick<User, 'teamId' | 'email' | 'name' | 'role' | 'passwordHash'> &
  Partial<Pick<User, 'timeZone' | 'weightUnit' | 'volumeUnit'>>;

export type UserChanges = Partial<
  Pick<User, 'name' | 'timeZone' | 'weightUnit' | 'volumeUnit' | 'passwordHash' | 'passwordChangedAt'>
>;

export class UserRepository {
  constructor(private readonly manager: EntityManager) {}

  findById(id: string): Promise<User | null> {
    return this.manager.findOneBy(User, { id });
  }

  /** `email` must already be normalised (trimmed, lower-cased) as the shared schema does. */
  findByEmail(email: string): Promise<User | null> {
    return this.manager.findOneBy(User, { email });
  }

  async existsByEmail(email: string): Promise<boolean> {
    return this.manager.existsBy(User, { email });
  }

  findInTeam(id: string, teamId: string): Promise<User | null> {
    return this.manager.findOneBy(User, { id, teamId });
  }

  /** Staff of a team (owner, coaches, assistants), by name. */
  listStaff(teamId: string): Promise<User[]> {
    return this.manager.find(User, {
      where: { teamId, role: In([...STAFF_ROLES] as Role[]) },
      order: { name: 'ASC', email: 'ASC' },
    });
  }

  create(input: NewUser): Promise<User> {
    return this.manager.save(this.manager.create(User, input));
  }

  async update(id: string, changes: UserChanges): Promise<void> {
    if (Object.keys(changes).length === 0) return;
    await this.manager.update(User, { id }, changes);
  }
}
