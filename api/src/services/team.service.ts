import type { GuardrailFloors } from '@driftmark/shared';
import type { DataSource } from 'typeorm';
import type { Actor } from '../policies/actor.js';
import { presentTeamMember, type TeamMember } from '../presenters/team.presenter.js';
import { TeamRepository } from '../repositories/team.repository.js';
import { UserRepository } from '../repositories/user.repository.js';

const ROLE_ORDER = { owner: 0, coach: 1, assistant: 2, athlete: 3 } as const;

type TeamDeps = { dataSource: DataSource };

export class TeamService {
  constructor(private readonly deps: TeamDeps) {}

  /** The team's staff (for share and assign pickers): head coach, coaches, assistants, by name. */
  async listStaff(actor: Actor): Promise<TeamMember[]> {
    const staff = await new UserRepository(this.deps.dataSource.manager).listStaff(actor.teamId);
    return staff
      .sort(
        (a, b) =>
          ROLE_ORDER[a.role] - ROLE_ORDER[b.role] ||
          a.name.localeCompare(b.name, 'en', { sensitivity: 'base' }),
      )
      .map(presentTeamMember);
  }

  /** The team's guardrail floors (GUARDRAIL_DEFAULTS until the owner sets them). */
  guardrailFloors(teamId: string): Promise<GuardrailFloors> {
    return new TeamRepository(this.deps.dataSource.manager).guardrailFloors(teamId);
  }

  async replaceGuardrailFloors(teamId: string, floors: GuardrailFloors): Promise<GuardrailFloors> {
    const teams = new TeamRepository(this.deps.dataSource.manager);
    await teams.replaceGuardrailFloors(teamId, floors);
    return teams.guardrailFloors(teamId);
  }
}
