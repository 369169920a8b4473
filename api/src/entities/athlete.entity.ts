import { Check, Column, Entity, Index, JoinColumn, ManyToOne } from 'typeorm';
import type { ATHLETE_STATUSES, EVENT_TYPES, GOALS, SEXES, Weekday, WeighInTiming } from '@driftmark/shared';
import { BaseRecord } from './base.entity.js';
import { Team } from './team.entity.js';
import { User } from './user.entity.js';

export type AthleteStatus = (typeof ATHLETE_STATUSES)[number];
export type Sex = (typeof SEXES)[number];
export type Goal = (typeof GOALS)[number];
export type EventType = (typeof EVENT_TYPES)[number];

/** The coaching side of an athlete's account. Quantities are SI (cm, mL, kcal, kg). */
@Entity({ name: 'athletes' })
@Check('CHK_athletes_status', `"status" IN ('intake_pending', 'active', 'ended')`)
@Check('CHK_athletes_sex', `"sex" IS NULL OR "sex" IN ('female', 'male')`)
@Check('CHK_athletes_goal', `"goal" IS NULL OR "goal" IN ('lose', 'maintain', 'gain')`)
@Check(
  'CHK_athletes_check_in_weekday',
  `"check_in_weekday" IN ('mon', 'tue', 'wed', 'thu', 'fri', 'sat', 'sun')`,
)
@Check(
  'CHK_athletes_event_type',
  `"event_type" IS NULL OR "event_type" IN ('show', 'shoot', 'weigh_in', 'none')`,
)
@Check(
  'CHK_athletes_weigh_in_timing',
  `"weigh_in_timing" IS NULL OR "weigh_in_timing" IN ('day_before', 'same_day')`,
)
export class Athlete extends BaseRecord {
  @Index('UQ_athletes_user_id', { unique: true })
  @Column({ name: 'user_id', type: 'uuid' })
  userId: string;

  // Many-to-one on purpose: the unique index above already makes it one-to-one, and a
  // @OneToOne would add a second, auto-named unique constraint on the same column.
  @ManyToOne(() => User, { onDelete: 'CASCADE', nullable: false })
  @JoinColumn({ name: 'user_id', foreignKeyConstraintName: 'FK_athletes_user_id' })
  user?: User;

  @Index('IDX_athletes_team_id')
  @Column({ name: 'team_id', type: 'uuid' })
  teamId: string;

  @ManyToOne(() => Team, { onDelete: 'CASCADE', nullable: false })
  @JoinColumn({ name: 'team_id', foreignKeyConstraintName: 'FK_athletes_team_id' })
  team?: Team;

  /** The assigned coach. RESTRICT: a coach with athletes must hand them over before leaving. */
  @Index('IDX_athletes_coach_id')
  @Column({ name: 'coach_id', type: 'uuid' })
  coachId: string;

  @ManyToOne(() => User, { onDelete: 'RESTRICT', nullable: false })
  @JoinColumn({ name: 'coach_id', foreignKeyConstraintName: 'FK_athletes_coach_id' })
  coach?: User;

  @Column({ type: 'varchar', length: 16, default: 'intake_pending' })
  status: AthleteStatus;

  @Column({ type: 'varchar', length: 8, nullable: true })
  sex: Sex | null;

  /** YYYY-MM-DD. */
  @Column({ name: 'birth_date', type: 'date', nullable: true })
  birthDate: string | null;

  @Column({ name: 'height_cm', type: 'double precision', nullable: true })
  heightCm: number | null;

  /** Body weight the athlete gave at intake, kg: the plan's weight until weigh-ins exist. */
  @Column({ name: 'intake_weight_kg', type: 'double precision', nullable: true })
  intakeWeightKg: number | null;

  @Column({ name: 'usual_water_ml', type: 'double precision', nullable: true })
  usualWaterMl: number | null;

  @Column({ name: 'usual_energy_kcal', type: 'double precision', nullable: true })
  usualEnergyKcal: number | null;

  @Column({ type: 'varchar', length: 16, nullable: true })
  goal: Goal | null;

  @Column({ name: 'event_type', type: 'varchar', length: 16, nullable: true })
  eventType: EventType | null;

  @Column({ name: 'event_name', type: 'varchar', length: 100, nullable: true })
  eventName: string | null;

  /** YYYY-MM-DD in the event's time zone. */
  @Index('IDX_athletes_event_date')
  @Column({ name: 'event_date', type: 'date', nullable: true })
  eventDate: string | null;

  /** HH:MM in the event's time zone. */
  @Column({ name: 'event_time', type: 'varchar', length: 5, nullable: true })
  eventTime: string | null;

  @Column({ name: 'event_time_zone', type: 'varchar', length: 64, nullable: true })
  eventTimeZone: string | null;

  @Column({ type: 'varchar', length: 100, nullable: true })
  division: string | null;

  @Column({ name: 'weigh_in_limit_kg', type: 'double precision', nullable: true })
  weighInLimitKg: number | null;

  /** Weigh-in the day before the competition or the same day (weigh-in events only). */
  @Column({ name: 'weigh_in_timing', type: 'varchar', length: 16, nullable: true })
  weighInTiming: WeighInTiming | null;

  /** Competition clock time, HH:MM in the event's time zone (weigh-in events). */
  @Column({ name: 'competition_time', type: 'varchar', length: 5, nullable: true })
  competitionTime: string | null;

  /** The athlete's usual weight outside a cut, kg. */
  @Column({ name: 'usual_weight_kg', type: 'double precision', nullable: true })
  usualWeightKg: number | null;

  /** The next class's limits below and above the athlete's, kg. */
  @Column({ name: 'class_below_kg', type: 'double precision', nullable: true })
  classBelowKg: number | null;

  @Column({ name: 'class_above_kg', type: 'double precision', nullable: true })
  classAboveKg: number | null;

  @Column({ name: 'photo_consent', type: 'boolean', default: false })
  photoConsent: boolean;

  @Column({ name: 'intake_completed_at', type: 'timestamptz', nullable: true })
  intakeCompletedAt: Date | null;

  /** The weekday (athlete's time zone) the weekly check-in is due on. */
  @Column({ name: 'check_in_weekday', type: 'varchar', length: 3, default: 'mon' })
  checkInWeekday: Weekday;
}
