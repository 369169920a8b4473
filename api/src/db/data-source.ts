import 'reflect-metadata';
import { DataSource, type Logger as TypeOrmLogger } from 'typeorm';
import type { Config } from '../config.js';
import { Athlete } from '../entities/athlete.entity.js';
import { BodyMeasurement } from '../entities/body-measurement.entity.js';
import { AthleteFlag } from '../entities/athlete-flag.entity.js';
import { AthleteReview } from '../entities/athlete-review.entity.js';
import { AthleteShare } from '../entities/athlete-share.entity.js';
import { ConditionPhoto } from '../entities/condition-photo.entity.js';
import { Consent } from '../entities/consent.entity.js';
import { CutPlan } from '../entities/cut-plan.entity.js';
import { CutPlanAcknowledgement } from '../entities/cut-plan-acknowledgement.entity.js';
import { CutRehearsalNote } from '../entities/cut-rehearsal-note.entity.js';
import { CountdownTemplate } from '../entities/countdown-template.entity.js';
import { EveningLog } from '../entities/evening-log.entity.js';
import { FluidEntry } from '../entities/fluid-entry.entity.js';
import { Food } from '../entities/food.entity.js';
import { GuardrailAcknowledgement } from '../entities/guardrail-acknowledgement.entity.js';
import { Invitation } from '../entities/invitation.entity.js';
import { Mark } from '../entities/mark.entity.js';
import { MarkRead } from '../entities/mark-read.entity.js';
import { MarkReply } from '../entities/mark-reply.entity.js';
import { MealEntry } from '../entities/meal-entry.entity.js';
import { MealEntryItem } from '../entities/meal-entry-item.entity.js';
import { OutboxMessage } from '../entities/outbox-message.entity.js';
import { PasswordResetToken } from '../entities/password-reset-token.entity.js';
import { PlanVersion } from '../entities/plan-version.entity.js';
import { RateLimitCounter } from '../entities/rate-limit-counter.entity.js';
import { Session } from '../entities/session.entity.js';
import { SupplementEntry } from '../entities/supplement-entry.entity.js';
import { SymptomReport } from '../entities/symptom-report.entity.js';
import { Team } from '../entities/team.entity.js';
import { User } from '../entities/user.entity.js';
import { WeighIn } from '../entities/weigh-in.entity.js';
import { NotificationSend } from '../entities/notification-send.entity.js';
import { WeeklyCheckIn } from '../entities/weekly-check-in.entity.js';
import { MIGRATIONS } from './migrations/index.js';
import { DriftmarkNamingStrategy } from './naming-strategy.js';

/** Every entity, listed explicitly: globs break under vitest and in the built output alike. */
export const ENTITIES = [
  Team,
  User,
  Session,
  PasswordResetToken,
  RateLimitCounter,
  Invitation,
  Athlete,
  AthleteShare,
  Consent,
  OutboxMessage,
  // Daily check-in
  WeighIn,
  FluidEntry,
  MealEntry,
  MealEntryItem,
  SupplementEntry,
  EveningLog,
  SymptomReport,
  AthleteFlag,
  Food,
  // Condition photos
  ConditionPhoto,
  // Plans, countdown templates and guardrails
  PlanVersion,
  GuardrailAcknowledgement,
  CountdownTemplate,
  // Marks and the review queue
  Mark,
  MarkReply,
  MarkRead,
  AthleteReview,
  // Weekly check-ins and e-mail notifications
  WeeklyCheckIn,
  NotificationSend,
  // Making weight
  CutPlan,
  CutPlanAcknowledgement,
  CutRehearsalNote,
  // Body composition
  BodyMeasurement,
];

/** Statements this process has sent through TypeORM, counted only when `countStatements` is on. */
export const statementCount = { total: 0 };

/** Counts every statement TypeORM sends (transaction control included) and logs nothing. */
class StatementCounter implements TypeOrmLogger {
  logQuery(): void {
    statementCount.total += 1;
  }
  logQueryError(): void {}
  logQuerySlow(): void {}
  logSchemaBuild(): void {}
  logMigration(): void {}
  log(): void {}
}

export function createDataSource(
  config: Pick<Config, 'databaseUrl'>,
  options: { poolSize?: number; countStatements?: boolean } = {},
): DataSource {
  return new DataSource({
    ...(options.countStatements ? { logger: new StatementCounter() } : {}),
    type: 'postgres',
    url: config.databaseUrl,
    entities: ENTITIES,
    migrations: MIGRATIONS,
    migrationsTableName: 'migrations',
    migrationsTransactionMode: 'each',
    namingStrategy: new DriftmarkNamingStrategy(),
    synchronize: false,
    logging: false,
    // gen_random_uuid() is built into PostgreSQL 13+, so no extension has to be installed.
    uuidExtension: 'pgcrypto',
    installExtensions: false,
    poolSize: options.poolSize ?? 10,
    extra: { connectionTimeoutMillis: 5000 },
  });
}
