import type { Me } from '@driftmark/shared';
import type { Athlete } from '../entities/athlete.entity.js';
import type { Team } from '../entities/team.entity.js';
import type { User } from '../entities/user.entity.js';

export function presentMe(
  user: User,
  team: Pick<Team, 'id' | 'name'>,
  athlete: Pick<Athlete, 'id' | 'intakeCompletedAt'> | null,
): Me {
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
  };
}
