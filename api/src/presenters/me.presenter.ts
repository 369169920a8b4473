import { INVITABLE_ROLES, type Me } from '@driftmark/shared';
import type { Actor } from '../policies/actor.js';
import { canOnTeam } from '../policies/team.policy.js';
import type { Athlete } from '../entities/athlete.entity.js';
import type { Team } from '../entities/team.entity.js';
import type { User } from '../entities/user.entity.js';

export function presentMe(
  user: User,
  team: Pick<Team, 'id' | 'name'>,
  athlete: Pick<Athlete, 'id' | 'intakeCompletedAt'> | null,
): Me {
  const actor: Actor = { userId: user.id, role: user.role, teamId: user.teamId };
  const teamTarget = { id: team.id };
  return {
    id: user.id,
    email: user.email,
    name: user.name,
    role: user.role,
    team: { id: team.id, name: team.name },
    athleteId: athlete?.id ?? null,
    intakeComplete: user.role === 'athlete' ? Boolean(athlete?.intakeCompletedAt) : true,
    timeZone: user.timeZone,
    units: { weight: user.weightUnit, volume: user.volumeUnit },
    abilities: {
      invite: INVITABLE_ROLES.filter((role) => canOnTeam(actor, { kind: 'invite', role }, teamTarget)),
      manageTeam: canOnTeam(actor, { kind: 'manageSettings' }, teamTarget),
    },
  };
}
