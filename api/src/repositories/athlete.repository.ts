import { Brackets, type EntityManager } from 'typeorm';
import { Athlete } from '../entities/athlete.entity.js';
import { AthleteShare } from '../entities/athlete-share.entity.js';
import type { User } from '../entities/user.entity.js';

/** An athlete with the two people every view of it names: the athlete and the coach. */
export type AthleteWithPeople = Athlete & { user: User; coach: User };

export type AthleteChanges = Partial<
  Pick<
    Athlete,
    | 'status'
    | 'coachId'
    | 'sex'
    | 'birthDate'
    | 'heightCm'
    | 'intakeWeightKg'
    | 'usualWaterMl'
    | 'usualEnergyKcal'
    | 'goal'
    | 'eventType'
    | 'eventName'
    | 'eventDate'
    | 'eventTime'
    | 'eventTimeZone'
    | 'division'
    | 'weighInLimitKg'
    | 'weighInTiming'
    | 'competitionTime'
    | 'usualWeightKg'
    | 'classBelowKg'
    | 'classAboveKg'
    | 'photoConsent'
    | 'intakeCompletedAt'
    | 'checkInWeekday'
  >
>;

/** Which athletes of a team a roster query returns (the policy still confirms each row). */
export type RosterScope =
  { kind: 'team' } | { kind: 'coachOrShared'; userId: string } | { kind: 'shared'; userId: string };

export class AthleteRepository {
  constructor(private readonly manager: EntityManager) {}

  findWithPeople(id: string): Promise<AthleteWithPeople | null> {
    return this.manager.findOne(Athlete, {
      where: { id },
      relations: { user: true, coach: true },
    }) as Promise<AthleteWithPeople | null>;
  }

  /**
   * The athlete with both people and the user ids it is shared with (what the athlete policy
   * needs), in one statement: every request about an athlete starts here.
   */
  async findForAccess(
    id: string,
  ): Promise<{ athlete: AthleteWithPeople; sharedWithUserIds: string[] } | null> {
    const { entities, raw } = await this.manager
      .createQueryBuilder(Athlete, 'a')
      .leftJoinAndSelect('a.user', 'u')
      .leftJoinAndSelect('a.coach', 'c')
      .addSelect(
        'ARRAY(SELECT sh.user_id::text FROM athlete_shares sh WHERE sh.athlete_id = a.id)',
        'shared_user_ids',
      )
      .where('a.id = :id', { id })
      .getRawAndEntities<{ shared_user_ids: string[] }>();
    const athlete = entities[0];
    if (!athlete) return null;
    return { athlete: athlete as AthleteWithPeople, sharedWithUserIds: raw[0]?.shared_user_ids ?? [] };
  }

  /** Locks the athlete row inside the caller's transaction (serialises writes about one athlete). */
  async lockForUpdate(id: string): Promise<void> {
    await this.manager.findOne(Athlete, { where: { id }, lock: { mode: 'pessimistic_write' } });
  }

  findByUserId(userId: string): Promise<Athlete | null> {
    return this.manager.findOneBy(Athlete, { userId });
  }

  create(input: Pick<Athlete, 'userId' | 'teamId' | 'coachId'> & AthleteChanges): Promise<Athlete> {
    return this.manager.save(
      this.manager.create(Athlete, { status: 'intake_pending', photoConsent: false, ...input }),
    );
  }

  async update(id: string, changes: AthleteChanges): Promise<void> {
    if (Object.keys(changes).length === 0) return;
    await this.manager.update(Athlete, { id }, changes);
  }

  listForRoster(teamId: string, scope: RosterScope): Promise<AthleteWithPeople[]> {
    const qb = this.manager
      .createQueryBuilder(Athlete, 'a')
      .innerJoinAndSelect('a.user', 'u')
      .innerJoinAndSelect('a.coach', 'c')
      .where('a.team_id = :teamId', { teamId });
    const shared = (alias: string) =>
      qb
        .subQuery()
        .select('1')
        .from(AthleteShare, alias)
        .where(`${alias}.athlete_id = a.id`)
        .andWhere(`${alias}.user_id = :userId`)
        .getQuery();
    if (scope.kind === 'coachOrShared') {
      qb.andWhere(
        new Brackets((w) => {
          w.where('a.coach_id = :userId').orWhere(`EXISTS ${shared('s')}`);
        }),
        { userId: scope.userId },
      );
    } else if (scope.kind === 'shared') {
      qb.andWhere(`EXISTS ${shared('s')}`, { userId: scope.userId });
    }
    return qb.getMany() as Promise<AthleteWithPeople[]>;
  }
}
