import {
  ACUTE_SHARE_DEFAULT_PCT,
  cutSettingsRequest,
  GUARDRAIL_DEFAULTS,
  guardrailFloors,
  type GuardrailFloors,
} from '@driftmark/shared';
import type { EntityManager } from 'typeorm';
import { Team } from '../entities/team.entity.js';

export class TeamRepository {
  constructor(private readonly manager: EntityManager) {}

  findById(id: string): Promise<Team | null> {
    return this.manager.findOneBy(Team, { id });
  }

  create(input: Pick<Team, 'name'> & Partial<Pick<Team, 'settings'>>): Promise<Team> {
    return this.manager.save(this.manager.create(Team, { settings: {}, ...input }));
  }

  /** The team's guardrail floors (`settings.guardrails`), or the defaults when unset or malformed. */
  async guardrailFloors(teamId: string): Promise<GuardrailFloors> {
    const team = await this.manager.findOne(Team, {
      where: { id: teamId },
      select: { id: true, settings: true },
    });
    const parsed = guardrailFloors.safeParse(team?.settings?.guardrails);
    return parsed.success ? parsed.data : GUARDRAIL_DEFAULTS;
  }

  /** The team's acute-share threshold for cut plans (`settings.acuteSharePct`), else the default 5 %. */
  async acuteSharePct(teamId: string): Promise<number> {
    const team = await this.findSettings(teamId);
    const parsed = cutSettingsRequest.shape.acuteSharePct.safeParse(team?.settings?.acuteSharePct);
    return parsed.success ? parsed.data : ACUTE_SHARE_DEFAULT_PCT;
  }

  /** Sets the acute-share threshold in one statement, leaving the other settings as they are. */
  async setAcuteSharePct(teamId: string, pct: number): Promise<void> {
    await this.manager.query(
      `UPDATE "teams" SET "settings" = "settings" || jsonb_build_object('acuteSharePct', $2::float8), "updated_at" = now() WHERE "id" = $1`,
      [teamId, pct],
    );
  }

  /** Replaces the floors in one statement, leaving the other settings as they are. */
  async replaceGuardrailFloors(teamId: string, floors: GuardrailFloors): Promise<void> {
    await this.manager.query(
      `UPDATE "teams" SET "settings" = "settings" || jsonb_build_object('guardrails', $2::jsonb), "updated_at" = now() WHERE "id" = $1`,
      [teamId, JSON.stringify(floors)],
    );
  }

  /** The team's id and settings only (what the weekly check-in and the queue read). */
  findSettings(teamId: string): Promise<Pick<Team, 'id' | 'settings'> | null> {
    return this.manager.findOne(Team, { where: { id: teamId }, select: { id: true, settings: true } });
  }

  /** Replaces the weekly check-in questions in one statement, leaving the other settings as they are. */
  async replaceCheckInQuestions(teamId: string, questions: unknown): Promise<void> {
    await this.manager.query(
      `UPDATE "teams" SET "settings" = "settings" || jsonb_build_object('checkInQuestions', $2::jsonb), "updated_at" = now() WHERE "id" = $1`,
      [teamId, JSON.stringify(questions)],
    );
  }
}
