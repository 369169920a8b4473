import { Column, Entity, Index, JoinColumn, ManyToOne } from 'typeorm';
import { Athlete } from './athlete.entity.js';
import { ClientDayEntry } from './day-record.entity.js';

/** A supplement taken (free entries until plans bring schedules). */
@Entity({ name: 'supplement_entries' })
@Index('UQ_supplement_entries_athlete_id_client_id', ['athleteId', 'clientId'], { unique: true })
@Index('IDX_supplement_entries_athlete_id_local_date', ['athleteId', 'localDate'])
export class SupplementEntry extends ClientDayEntry {
  @ManyToOne(() => Athlete, { onDelete: 'CASCADE', nullable: false })
  @JoinColumn({ name: 'athlete_id', foreignKeyConstraintName: 'FK_supplement_entries_athlete_id' })
  athlete?: Athlete;

  @Column({ type: 'varchar', length: 80 })
  name: string;

  @Column({ type: 'double precision', nullable: true })
  dose: number | null;

  @Column({ name: 'dose_unit', type: 'varchar', length: 16, nullable: true })
  doseUnit: string | null;

  /** The schedule item this ticks; no foreign key until plans (and their table) exist. */
  @Column({ name: 'schedule_item_id', type: 'uuid', nullable: true })
  scheduleItemId: string | null;
}
