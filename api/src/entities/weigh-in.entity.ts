import { Check, Column, Entity, Index, JoinColumn, ManyToOne } from 'typeorm';
import type { CYCLE_PHASES, WeighInTag, WeightUnit } from '@driftmark/shared';
import { Athlete } from './athlete.entity.js';
import { TimedDayRecord } from './day-record.entity.js';

export type CyclePhase = (typeof CYCLE_PHASES)[number];

/** The morning weigh-in: one per athlete and day (a second PUT replaces it). */
@Entity({ name: 'weigh_ins' })
@Index('UQ_weigh_ins_athlete_id_local_date', ['athleteId', 'localDate'], { unique: true })
@Check('CHK_weigh_ins_entered_unit', `"entered_unit" IN ('kg', 'lb')`)
@Check(
  'CHK_weigh_ins_cycle_phase',
  `"cycle_phase" IS NULL OR "cycle_phase" IN ('menstrual', 'follicular', 'ovulation', 'luteal')`,
)
@Check('CHK_weigh_ins_weight_kg', `"weight_kg" > 0`)
export class WeighIn extends TimedDayRecord {
  @ManyToOne(() => Athlete, { onDelete: 'CASCADE', nullable: false })
  @JoinColumn({ name: 'athlete_id', foreignKeyConstraintName: 'FK_weigh_ins_athlete_id' })
  athlete?: Athlete;

  @Column({ name: 'weight_kg', type: 'double precision' })
  weightKg: number;

  /** The number as typed, in `entered_unit`, so it comes back exactly. */
  @Column({ name: 'entered_value', type: 'double precision' })
  enteredValue: number;

  @Column({ name: 'entered_unit', type: 'varchar', length: 4 })
  enteredUnit: WeightUnit;

  @Column({ name: 'protocol_confirmed', type: 'boolean' })
  protocolConfirmed: boolean;

  @Column({ type: 'jsonb', default: () => "'[]'" })
  tags: WeighInTag[];

  @Column({ name: 'cycle_phase', type: 'varchar', length: 16, nullable: true })
  cyclePhase: CyclePhase | null;
}
