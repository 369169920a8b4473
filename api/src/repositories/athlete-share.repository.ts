import { In, type EntityManager } from 'typeorm';
import { AthleteShare } from '../entities/athlete-share.entity.js';

export class AthleteShareRepository {
  constructor(private readonly manager: EntityManager) {}

  /** athlete id → user ids it is shared with. */
  async listUserIdsByAthlete(athleteIds: string[]): Promise<Map<string, string[]>> {
    const map = new Map<string, string[]>();
    if (athleteIds.length === 0) return map;
    const rows = await this.manager.find(AthleteShare, {
      where: { athleteId: In(athleteIds) },
      select: { athleteId: true, userId: true },
    });
    for (const row of rows) {
      const list = map.get(row.athleteId) ?? [];
      list.push(row.userId);
      map.set(row.athleteId, list);
    }
    return map;
  }

  /** Adds the share; sharing twice is a no-op. */
  async add(input: Pick<AthleteShare, 'athleteId' | 'userId' | 'sharedById'>): Promise<void> {
    await this.manager.createQueryBuilder().insert().into(AthleteShare).values(input).orIgnore().execute();
  }

  async remove(athleteId: string, userId: string): Promise<void> {
    await this.manager.delete(AthleteShare, { athleteId, userId });
  }
}
