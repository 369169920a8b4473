import { Check, Column, Entity, Index, JoinColumn, ManyToOne } from 'typeorm';
import type { FLUID_KINDS, VolumeUnit } from '@driftmark/shared';
import { Athlete } from './athlete.entity.js';
import { ClientDayEntry } from './day-record.entity.js';

export type FluidKind = (typeof FLUID_KINDS)[number];

/** Something the athlete drank. */
@Entity({ name: 'fluid_entries' })
@Index('UQ_fluid_entries_athlete_id_client_id', ['athleteId', 'clientId'], { unique: true })
@Index('IDX_fluid_entries_athlete_id_local_date', ['athleteId', 'localDate'])
@Check('CHK_fluid_entries_entered_unit', `"entered_unit" IN ('ml', 'floz')`)
@Check('CHK_fluid_entries_kind', `"kind" IN ('water', 'coffee_tea', 'other')`)
@Check('CHK_fluid_entries_volume_ml', `"volume_ml" > 0`)
export class FluidEntry extends ClientDayEntry {
  @ManyToOne(() => Athlete, { onDelete: 'CASCADE', nullable: false })
  @JoinColumn({ name: 'athlete_id', foreignKeyConstraintName: 'FK_fluid_entries_athlete_id' })
  athlete?: Athlete;

  @Column({ name: 'volume_ml', type: 'double precision' })
  volumeMl: number;

  /** The number as typed, in `entered_unit`, so it comes back exactly. */
  @Column({ name: 'entered_value', type: 'double precision' })
  enteredValue: number;

  @Column({ name: 'entered_unit', type: 'varchar', length: 4 })
  enteredUnit: VolumeUnit;

  @Column({ type: 'varchar', length: 16 })
  kind: FluidKind;

  /** Sodium the drink carried, mg (a recovery drink after a weigh-in); null when unknown. */
  @Column({ name: 'sodium_mg', type: 'double precision', nullable: true })
  sodiumMg: number | null;
}
