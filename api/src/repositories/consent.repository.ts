import type { EntityManager } from 'typeorm';
import { Consent } from '../entities/consent.entity.js';

export class ConsentRepository {
  constructor(private readonly manager: EntityManager) {}

  async record(
    rows: Pick<Consent, 'userId' | 'kind' | 'version' | 'granted' | 'acceptedAt'>[],
  ): Promise<void> {
    if (rows.length === 0) return;
    await this.manager.insert(Consent, rows);
  }

  listForUser(userId: string): Promise<Consent[]> {
    return this.manager.find(Consent, { where: { userId }, order: { acceptedAt: 'ASC' } });
  }
}
