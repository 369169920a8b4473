import type { GuardrailCode, GuardrailScope } from '@driftmark/shared';
import { Check, Column, Entity, Index, JoinColumn, ManyToOne } from 'typeorm';
import { Athlete } from './athlete.entity.js';
import { BaseRecord } from './base.entity.js';
import { PlanVersion } from './plan-version.entity.js';
import { User } from './user.entity.js';

/**
 * A guardrail warning the coach acknowledged when saving a plan version: what was flagged (with
 * the words and source shown at the time), who accepted it and when. The athlete's days covered
 * by its scope show it as a caution.
 */
@Entity({ name: 'guardrail_acknowledgements' })
@Index('UQ_guardrail_acknowledgements_plan_version_id_key', ['planVersionId', 'key'], { unique: true })
@Check('CHK_guardrail_acknowledgements_severity', `"severity" IN ('warning', 'strong')`)
export class GuardrailAcknowledgement extends BaseRecord {
  @Column({ name: 'plan_version_id', type: 'uuid' })
  planVersionId: string;

  @ManyToOne(() => PlanVersion, { onDelete: 'CASCADE', nullable: false })
  @JoinColumn({
    name: 'plan_version_id',
    foreignKeyConstraintName: 'FK_guardrail_acknowledgements_plan_version_id',
  })
  planVersion?: PlanVersion;

  @Index('IDX_guardrail_acknowledgements_athlete_id')
  @Column({ name: 'athlete_id', type: 'uuid' })
  athleteId: string;

  @ManyToOne(() => Athlete, { onDelete: 'CASCADE', nullable: false })
  @JoinColumn({ name: 'athlete_id', foreignKeyConstraintName: 'FK_guardrail_acknowledgements_athlete_id' })
  athlete?: Athlete;

  /** `${code}:${scope}`, as the warning carried it. */
  @Column({ type: 'varchar', length: 120 })
  key: string;

  @Column({ type: 'varchar', length: 32 })
  code: GuardrailCode;

  @Column({ type: 'varchar', length: 8 })
  severity: 'warning' | 'strong';

  @Column({ type: 'jsonb' })
  scope: GuardrailScope;

  @Column({ type: 'text' })
  message: string;

  @Column({ type: 'text' })
  source: string;

  /** RESTRICT: an acknowledgement without its author would be no record at all. */
  @Index('IDX_guardrail_acknowledgements_acknowledged_by_id')
  @Column({ name: 'acknowledged_by_id', type: 'uuid' })
  acknowledgedById: string;

  @ManyToOne(() => User, { onDelete: 'RESTRICT', nullable: false })
  @JoinColumn({
    name: 'acknowledged_by_id',
    foreignKeyConstraintName: 'FK_guardrail_acknowledgements_acknowledged_by_id',
  })
  acknowledgedBy?: User;

  @Column({ name: 'acknowledged_at', type: 'timestamptz' })
  acknowledgedAt: Date;
}
