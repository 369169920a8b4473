/**
 * Writes the demo team (demo-team.ts) into an empty database, with about four months of daily
 * check-ins per athlete (history.ts), placeholder condition photos (photos.ts), the team's countdown
 * templates and each athlete's plan versions (demo-plans.ts), and a few marks with replies on
 * their charts (seed-marks.ts). Idempotent: when the demo owner
 * already exists only the dates move, to keep the team around today (refresh-demo-dates.ts).
 * Refused in production.
 */
import bcrypt from 'bcryptjs';
import { CONSENTS } from '@driftmark/shared';
import type { DataSource, EntityManager } from 'typeorm';
import { createStorage, type StorageAdapter } from '../adapters/storage.js';
import { loadStorageConfig, type AppMode } from '../config.js';
import { Athlete } from '../entities/athlete.entity.js';
import { AthleteShare } from '../entities/athlete-share.entity.js';
import { Consent } from '../entities/consent.entity.js';
import { Team } from '../entities/team.entity.js';
import { User } from '../entities/user.entity.js';
import { addDays, localDate } from './calendar.js';
import {
  DEMO_ASSISTANT_EMAIL,
  DEMO_ATHLETES,
  DEMO_HISTORY_DAYS,
  DEMO_OWNER_EMAIL,
  DEMO_PASSWORD,
  DEMO_SEED,
  DEMO_STAFF,
  DEMO_TEAM_NAME,
  type DemoAthleteDefinition,
} from './demo-team.js';
import { createRandom } from './random.js';
import { refreshDemoDates, type RefreshWarn } from './refresh-demo-dates.js';
import { planDemoHistory, renderDemoPhotos, writeDemoCheckIns, writeDemoPhotos } from './seed-history.js';
import { writeDemoMarks } from './seed-marks.js';
import { writeDemoBodyMeasurements } from './seed-body-composition.js';
import { writeDemoRehearsals } from './seed-cuts.js';
import { writeDemoPlans, type DemoPlanIds } from './seed-plans.js';
import { writeDemoWeekly } from './seed-weekly.js';

/** bcrypt cost for the demo password (the same cost real accounts use). */
const BCRYPT_COST = 12;
const SEED_LOCK_KEY = 'driftmark:seed-demo';
const DAY_MS = 86_400_000;

export interface SeedDemoOptions {
  /** Where the date refresh reports stored rows it could not move (default: stderr). */
  warn?: RefreshWarn;
  /**
   * The seed date; event dates are counted from it in each athlete's time zone. On an already
   * seeded database, the date the demo team's dates are moved to.
   */
  now?: Date;
  /** Defaults to APP_MODE from the environment. */
  appMode?: AppMode | string;
  /**
   * Where the placeholder photos are stored; defaults to the photo store the server reads
   * (PHOTO_STORAGE: the UPLOADS_DIR folder or the S3 bucket). null seeds no photos.
   */
  storage?: StorageAdapter | null;
  /**
   * A bcrypt hash of DEMO_PASSWORD to reuse (tests that seed many times); by default one is made
   * at the cost real accounts use.
   */
  passwordHash?: string;
}

export interface SeedDemoResult {
  created: boolean;
  /** Days an existing team's dates moved forward to today (the most of any athlete); 0 when none. */
  movedDays: number;
}

export class SeedRefusedError extends Error {
  override readonly name = 'SeedRefusedError';
}

const NO_WEIGH_IN = {
  weighInTiming: null,
  competitionTime: null,
  usualWeightKg: null,
  classBelowKg: null,
  classAboveKg: null,
};

/** The intake answers and event of a definition, with dates resolved against the seed date. */
export function resolveDemoAthlete(def: DemoAthleteDefinition, now: Date) {
  const event =
    def.event.type === 'none'
      ? {
          eventType: 'none' as const,
          eventName: null,
          eventDate: null,
          eventTime: null,
          eventTimeZone: null,
          weighInLimitKg: null,
          ...NO_WEIGH_IN,
        }
      : {
          eventType: def.event.type,
          eventName: def.event.name,
          eventDate: addDays(localDate(now, def.event.timeZone), def.event.daysFromSeed),
          eventTime: def.event.time,
          eventTimeZone: def.event.timeZone,
          weighInLimitKg: def.event.weighInLimitKg,
          ...(def.event.weighIn
            ? {
                weighInTiming: def.event.weighIn.timing,
                competitionTime: def.event.weighIn.competitionTime,
                usualWeightKg: def.event.weighIn.usualWeightKg,
                classBelowKg: def.event.weighIn.classBelowKg,
                classAboveKg: def.event.weighIn.classAboveKg,
              }
            : NO_WEIGH_IN),
        };
  const division = def.event.type === 'none' ? (def.division ?? null) : def.event.division;
  return { ...def.intake, ...event, division };
}

export async function seedDemo(
  dataSource: DataSource,
  options: SeedDemoOptions = {},
): Promise<SeedDemoResult> {
  const appMode = options.appMode ?? process.env.APP_MODE;
  if (appMode === 'production') {
    throw new SeedRefusedError('The demo seed is refused in production (APP_MODE=production).');
  }
  const now = options.now ?? new Date();

  const storage = options.storage === undefined ? createStorage(loadStorageConfig()) : options.storage;

  if (await ownerExists(dataSource.manager)) {
    const movedDays = await dataSource.transaction(async (manager) => {
      // Two refreshes at once must not both move the dates: the second waits, then finds none to move.
      await lockSeed(manager);
      return refreshDemoDates(
        manager,
        now,
        options.warn ?? ((message, details) => console.warn(message, JSON.stringify(details))),
      );
    });
    return { created: false, movedDays };
  }
  const plans = planDemoHistory(DEMO_ATHLETES, now);
  // One hash for all demo accounts: bcrypt at cost 12 takes a noticeable fraction of a second.
  const passwordHash = options.passwordHash ?? (await bcrypt.hash(DEMO_PASSWORD, BCRYPT_COST));

  const written: string[] = [];
  let rendering: Promise<unknown> = Promise.resolve();
  let weeklyIds: DemoPlanIds | null = null;
  let result: SeedDemoResult;
  try {
    result = await dataSource.transaction(async (manager) => {
      // Two seeds started together (two terminals) must not both insert: the second waits here,
      // then sees the owner and stops.
      await lockSeed(manager);
      if (await ownerExists(manager)) return { created: false, movedDays: 0 };
      // Drawing and re-encoding the photos runs in sharp's threads while the rows are inserted.
      const photos = storage ? renderDemoPhotos(plans) : null;
      rendering = photos ?? rendering;
      photos?.catch(() => {});
      const ids = await writeDemoTeam(manager, passwordHash, now);
      const { athleteIds } = ids;
      await writeDemoCheckIns(manager, plans, athleteIds);
      await writeDemoPlans(manager, plans, ids, now);
      await writeDemoMarks(manager, plans, ids, now);
      const ownerName = DEMO_STAFF.find((s) => s.email === DEMO_OWNER_EMAIL)?.name ?? 'Coach';
      await writeDemoBodyMeasurements(manager, ids, now, ownerName);
      await writeDemoRehearsals(manager, ids, now);
      if (storage && photos) {
        await writeDemoPhotos(manager, plans, await photos, athleteIds, storage, written);
      }
      weeklyIds = ids;
      return { created: true, movedDays: 0 };
    });
  } catch (error) {
    // The rows rolled back; the files written before them go too.
    await rendering.catch(() => null);
    if (storage) await Promise.allSettled(written.map((key) => storage.delete(key)));
    throw error;
  }
  // After the commit: the stored weekly check-ins sum up the logs and photos written above, read
  // through the pool (the history loads in parallel, which a transaction's one connection can't).
  if (weeklyIds) await writeDemoWeekly(dataSource, weeklyIds, now);
  return result;
}

async function lockSeed(manager: EntityManager): Promise<void> {
  await manager.query('SELECT pg_advisory_xact_lock(hashtext($1))', [SEED_LOCK_KEY]);
}

async function ownerExists(manager: EntityManager): Promise<boolean> {
  return manager.getRepository(User).exists({ where: { email: DEMO_OWNER_EMAIL } });
}

/** Writes the team, staff and athletes; returns the team, owner and assistant ids and the athlete ids by definition key. */
async function writeDemoTeam(
  manager: EntityManager,
  passwordHash: string,
  now: Date,
): Promise<DemoPlanIds & { athleteIds: Map<string, string> }> {
  const athleteIds = new Map<string, string>();
  const random = createRandom(DEMO_SEED);
  const team = await manager
    .getRepository(Team)
    // The anchor: a later seed run moves the dates forward from it (refresh-demo-dates.ts).
    .save({ name: DEMO_TEAM_NAME, settings: { reminderHour: 10, demoAnchorAt: now.toISOString() } });

  const users = manager.getRepository(User);
  const staff = new Map<string, User>();
  for (const def of DEMO_STAFF) {
    staff.set(
      def.email,
      await users.save({
        teamId: team.id,
        email: def.email,
        name: def.name,
        role: def.role,
        passwordHash,
        timeZone: def.timeZone,
        weightUnit: def.weightUnit,
        volumeUnit: def.volumeUnit,
      }),
    );
  }
  const owner = staff.get(DEMO_OWNER_EMAIL);
  const assistant = staff.get(DEMO_ASSISTANT_EMAIL);
  if (!owner || !assistant) throw new Error('demo-team.ts must define the owner and the assistant');

  for (const def of DEMO_ATHLETES) {
    const user = await users.save({
      teamId: team.id,
      email: def.email,
      name: def.name,
      role: 'athlete' as const,
      passwordHash,
      timeZone: def.timeZone,
      weightUnit: def.weightUnit,
      volumeUnit: def.volumeUnit,
    });
    // Intake was done on the first morning of the generated history, at a varying hour.
    const intakeAt = new Date(
      now.getTime() - DEMO_HISTORY_DAYS * DAY_MS + random.int(7 * 60, 11 * 60) * 60_000,
    );
    const athlete = await manager.getRepository(Athlete).save({
      userId: user.id,
      teamId: team.id,
      coachId: owner.id,
      status: 'active' as const,
      ...resolveDemoAthlete(def, now),
      // The weight given at intake: the first morning of the generated history.
      intakeWeightKg: def.history.startWeightKg,
      intakeCompletedAt: intakeAt,
    });
    athleteIds.set(def.key, athlete.id);
    await manager.getRepository(Consent).save([
      {
        userId: user.id,
        kind: 'safety_acknowledgement' as const,
        version: CONSENTS.safety_acknowledgement.version,
        granted: true,
        acceptedAt: intakeAt,
      },
      {
        userId: user.id,
        kind: 'photo_consent' as const,
        version: CONSENTS.photo_consent.version,
        granted: def.intake.photoConsent,
        acceptedAt: intakeAt,
      },
    ]);
    if (def.sharedWithAssistant) {
      await manager
        .getRepository(AthleteShare)
        .save({ athleteId: athlete.id, userId: assistant.id, sharedById: owner.id });
    }
  }
  return { teamId: team.id, ownerId: owner.id, assistantId: assistant.id, athleteIds };
}
