import { Check, Column, Entity, Index, JoinColumn, ManyToOne } from 'typeorm';
import { BaseRecord } from './base.entity.js';
import { CutPlan } from './cut-plan.entity.js';
import { User } from './user.entity.js';

/**
 * A cut-plan warning the coach acknowledged with the athlete when saving the plan, as the
 * guardrail acknowledgements of a plan version: the words and source shown, who, when.
 */
@Entity({ name: 'cut_plan_acknowledgements' })
@Index('UQ_cut_plan_acknowledgements_cut_plan_id_key', ['cutPlanId', 'key'], { unique: true })
@Check('CHK_cut_plan_acknowledgements_severity', `"severity" IN ('warning', 'strong', 'severe')`)
export class CutPlanAcknowledgement extends BaseRecord {
  @Column({ name: 'cut_plan_id', type: 'uuid' })
  cutPlanId: string;

  @ManyToOne(() => CutPlan, { onDelete: 'CASCADE', nullable: false })
  @JoinColumn({ name: 'cut_plan_id', foreignKeyConstraintName: 'FK_cut_plan_acknowledgements_cut_plan_id' })
  cutPlan?: CutPlan;

  @Column({ type: 'varchar', length: 120 })
  key: string;

  @Column({ type: 'varchar', length: 8 })
  severity: 'warning' | 'strong' | 'severe';

  @Column({ type: 'text' })
  message: string;

  @Column({ type: 'text' })
  source: string;

  @Index('IDX_cut_plan_acknowledgements_acknowledged_by_id')
  @Column({ name: 'acknowledged_by_id', type: 'uuid' })
  acknowledgedById: string;

  @ManyToOne(() => User, { onDelete: 'RESTRICT', nullable: false })
  @JoinColumn({
    name: 'acknowledged_by_id',
    foreignKeyConstraintName: 'FK_cut_plan_acknowledgements_acknowledged_by_id',
  })
  acknowledgedBy?: User;

  @Column({ name: 'acknowledged_at', type: 'timestamptz' })
  acknowledgedAt: Date;
}
