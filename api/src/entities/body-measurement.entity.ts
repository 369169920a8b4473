import { Check, Column, Entity, Index, JoinColumn, ManyToOne } from 'typeorm';
import type { BodyCompositionMethod, DensityEquation, SkinfoldSite } from '@driftmark/shared';
import { Athlete } from './athlete.entity.js';
import { BaseRecord } from './base.entity.js';
import { User } from './user.entity.js';

/**
 * One body-composition measurement session on the athlete's local date: the raw skinfolds or
 * circumferences as taken. Estimates are computed when read (shared/src/body-composition.ts), from
 * the athlete's sex and age on the date, so a corrected equation corrects every past row.
 */
@Entity({ name: 'body_measurements' })
@Index('IDX_body_measurements_athlete_id_local_date', ['athleteId', 'localDate'])
@Check('CHK_body_measurements_method', `"method" IN ('skinfold_3', 'skinfold_7', 'circumference')`)
@Check('CHK_body_measurements_density_equation', `"density_equation" IN ('siri', 'brozek')`)
export class BodyMeasurement extends BaseRecord {
  @Column({ name: 'athlete_id', type: 'uuid' })
  athleteId: string;

  @ManyToOne(() => Athlete, { onDelete: 'CASCADE', nullable: false })
  @JoinColumn({ name: 'athlete_id', foreignKeyConstraintName: 'FK_body_measurements_athlete_id' })
  athlete?: Athlete;

  /** YYYY-MM-DD in the athlete's time zone. */
  @Column({ name: 'local_date', type: 'date' })
  localDate: string;

  @Column({ type: 'varchar', length: 16 })
  method: BodyCompositionMethod;

  @Column({ name: 'density_equation', type: 'varchar', length: 8 })
  densityEquation: DensityEquation;

  /** Site → mm, only the sites taken. */
  @Column({ name: 'skinfolds_mm', type: 'jsonb', default: () => "'{}'" })
  skinfoldsMm: Partial<Record<SkinfoldSite, number>>;

  @Column({ name: 'neck_cm', type: 'double precision', nullable: true })
  neckCm: number | null;

  @Column({ name: 'waist_cm', type: 'double precision', nullable: true })
  waistCm: number | null;

  @Column({ name: 'hip_cm', type: 'double precision', nullable: true })
  hipCm: number | null;

  @Column({ name: 'height_cm', type: 'double precision', nullable: true })
  heightCm: number | null;

  /** Who took it, as typed ("Coach Sam", "self"). */
  @Column({ name: 'measured_by', type: 'varchar', length: 80 })
  measuredBy: string;

  /** Who entered it. RESTRICT, like a plan version's author (staff are deactivated, never deleted). */
  @Index('IDX_body_measurements_entered_by_id')
  @Column({ name: 'entered_by_id', type: 'uuid' })
  enteredById: string;

  @ManyToOne(() => User, { onDelete: 'RESTRICT', nullable: false })
  @JoinColumn({ name: 'entered_by_id', foreignKeyConstraintName: 'FK_body_measurements_entered_by_id' })
  enteredBy?: User;
}
