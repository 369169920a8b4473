import type { DataSource } from 'typeorm';
import { Athlete } from '../../api/src/entities/athlete.entity.js';
import { AthleteShare } from '../../api/src/entities/athlete-share.entity.js';
import type { User } from '../../api/src/entities/user.entity.js';
import { createUser, type UserOverrides } from './users.js';

/** When the default athlete finished the intake; their event is placed from it, not from the calendar. */
const INTAKE_AT = new Date('2026-01-05T10:00:00Z');
/** The default event: about 17 months after the intake (tests that care pin their clock and set it). */
const EVENT_DATE = new Date(INTAKE_AT.getTime() + 512 * 86_400_000).toISOString().slice(0, 10);

export function buildAthlete(overrides: Partial<Athlete> = {}): Partial<Athlete> {
  return {
    status: 'active',
    sex: 'female',
    birthDate: '1995-04-12',
    heightCm: 168,
    usualWaterMl: 2500,
    usualEnergyKcal: 2100,
    goal: 'lose',
    eventType: 'show',
    eventName: 'Test Classic',
    eventDate: EVENT_DATE,
    eventTime: '09:00',
    eventTimeZone: 'UTC',
    division: 'Bikini',
    weighInLimitKg: null,
    photoConsent: true,
    intakeCompletedAt: INTAKE_AT,
    ...overrides,
  };
}

export interface CreatedAthlete {
  user: User;
  athlete: Athlete;
}

/** An athlete user and athlete row in the coach's team, coached by `coach`. */
export async function createAthlete(
  db: DataSource,
  options: { coach: User; user?: UserOverrides; athlete?: Partial<Athlete> },
): Promise<CreatedAthlete> {
  const user = await createUser(db, { ...options.user, role: 'athlete', teamId: options.coach.teamId });
  const repo = db.getRepository(Athlete);
  const athlete = await repo.save(
    repo.create(
      buildAthlete({ ...options.athlete, userId: user.id, teamId: user.teamId, coachId: options.coach.id }),
    ),
  );
  return { user, athlete };
}

export async function shareAthlete(
  db: DataSource,
  athlete: Athlete,
  withUser: User,
  by?: User,
): Promise<AthleteShare> {
  const repo = db.getRepository(AthleteShare);
  return repo.save(
    repo.create({ athleteId: athlete.id, userId: withUser.id, sharedById: by?.id ?? athlete.coachId }),
  );
}
