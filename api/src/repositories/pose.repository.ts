import type { EntityManager } from 'typeorm';
import { Team } from '../entities/team.entity.js';

/** The team's own pose list, kept in `teams.settings.poses`. */
export class PoseRepository {
  constructor(private readonly manager: EntityManager) {}

  async listForTeam(teamId: string): Promise<string[]> {
    const team = await this.manager.findOne(Team, {
      where: { id: teamId },
      select: { id: true, settings: true },
    });
    const poses = team?.settings?.poses;
    return Array.isArray(poses) ? poses.filter((p): p is string => typeof p === 'string') : [];
  }

  /** Replaces the list in one statement, leaving the other settings as they are. */
  async replace(teamId: string, poses: string[]): Promise<void> {
    await this.manager.query(
      `UPDATE "teams" SET "settings" = "settings" || jsonb_build_object('poses', $2::jsonb), "updated_at" = now() WHERE "id" = $1`,
      [teamId, JSON.stringify(poses)],
    );
  }
}
