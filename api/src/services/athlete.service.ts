import { CONSENTS, type AthleteProfile, type IntakeRequest } from '@driftmark/shared';
import type { DataSource } from 'typeorm';
import { conflict, notFound, validationFailed } from '../errors.js';
import type { Actor } from '../policies/actor.js';
import { AthleteRepository, type AthleteWithPeople } from '../repositories/athlete.repository.js';
import { AthleteShareRepository } from '../repositories/athlete-share.repository.js';
import { ConsentRepository } from '../repositories/consent.repository.js';
import { UserRepository } from '../repositories/user.repository.js';
import { athleteProfileView } from './plan.service.js';

type AthleteDeps = { dataSource: DataSource; clock: () => Date };

export class AthleteService {
  constructor(private readonly deps: AthleteDeps) {}

  /**
   * Stores the intake form: the profile (event fields cleared when there is no event), the
   * user's time zone and units, one consent row per text with its version and time, and
   * activates an athlete who was waiting for intake. One transaction.
   */
  async completeIntake(athlete: AthleteWithPeople, input: IntakeRequest): Promise<AthleteProfile> {
    const hasEvent = input.eventType !== 'none';
    await this.deps.dataSource.transaction(async (manager) => {
      const now = new Date();
      await new AthleteRepository(manager).update(athlete.id, {
        sex: input.sex,
        birthDate: input.birthDate,
        heightCm: input.heightCm,
        intakeWeightKg: input.currentWeightKg,
        usualWaterMl: input.usualWaterMl,
        usualEnergyKcal: input.usualEnergyKcal,
        goal: input.goal,
        eventType: input.eventType,
        eventName: hasEvent ? input.eventName || null : null,
        eventDate: hasEvent ? (input.eventDate ?? null) : null,
        eventTime: hasEvent ? (input.eventTime ?? null) : null,
        eventTimeZone: hasEvent ? (input.eventTimeZone ?? null) : null,
        division: input.division || null,
        weighInLimitKg: input.weighInLimitKg ?? null,
        photoConsent: input.photoConsent,
        ...(athlete.status === 'intake_pending' ? { status: 'active' as const } : {}),
        intakeCompletedAt: athlete.intakeCompletedAt ?? now,
      });
      await new UserRepository(manager).update(athlete.userId, {
        timeZone: input.timeZone,
        weightUnit: input.weightUnit,
        volumeUnit: input.volumeUnit,
      });
      await new ConsentRepository(manager).record([
        {
          userId: athlete.userId,
          kind: 'safety_acknowledgement',
          version: CONSENTS.safety_acknowledgement.version,
          granted: input.safetyAcknowledged,
          acceptedAt: now,
        },
        {
          userId: athlete.userId,
          kind: 'photo_consent',
          version: CONSENTS.photo_consent.version,
          granted: input.photoConsent,
          acceptedAt: now,
        },
      ]);
    });
    const updated = await new AthleteRepository(this.deps.dataSource.manager).findWithPeople(athlete.id);
    if (!updated) throw notFound();
    return athleteProfileView(this.deps.dataSource.manager, updated, this.deps.clock());
  }

  /** Shares the athlete with another coach or assistant of the team; sharing twice is a no-op. */
  async share(actor: Actor, athlete: AthleteWithPeople, userId: string): Promise<void> {
    const manager = this.deps.dataSource.manager;
    const person = await new UserRepository(manager).findInTeam(userId, athlete.teamId);
    if (
      !person ||
      (person.role !== 'assistant' && person.role !== 'coach') ||
      person.id === athlete.coachId
    ) {
      throw validationFailed({ userId: 'Choose an assistant or another coach of your team' });
    }
    await new AthleteShareRepository(manager).add({
      athleteId: athlete.id,
      userId,
      sharedById: actor.userId,
    });
  }

  /**
   * Ends the coaching: status 'ended'. The athlete keeps their sign-in and read access to their own
   * history (and its export); logging is refused from now on (see `loadAthleteById`).
   */
  async endCoaching(athlete: AthleteWithPeople): Promise<AthleteWithPeople> {
    if (athlete.status === 'ended') throw conflict('The coaching has already ended.');
    const repo = new AthleteRepository(this.deps.dataSource.manager);
    await repo.update(athlete.id, { status: 'ended' });
    const updated = await repo.findWithPeople(athlete.id);
    if (!updated) throw notFound();
    return updated;
  }

  async unshare(athlete: AthleteWithPeople, userId: string): Promise<void> {
    await new AthleteShareRepository(this.deps.dataSource.manager).remove(athlete.id, userId);
  }
}
