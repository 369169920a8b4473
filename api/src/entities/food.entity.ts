import { Column, Entity, Index, JoinColumn, ManyToOne } from 'typeorm';
import { Athlete } from './athlete.entity.js';
import { BaseRecord } from './base.entity.js';
import { Team } from './team.entity.js';
import { User } from './user.entity.js';

/**
 * A team's own food, or (with `athleteId`) one athlete's personal food, nutrients per 100 g (energy
 * follows from the Atwater factors). A personal food is seen only by its athlete and the staff who
 * read that athlete (`policies/food.policy.ts`).
 */
@Entity({ name: 'foods' })
@Index('IDX_foods_athlete_id_barcode', ['athleteId', 'barcode'])
export class Food extends BaseRecord {
  @Index('IDX_foods_team_id')
  @Column({ name: 'team_id', type: 'uuid' })
  teamId: string;

  @ManyToOne(() => Team, { onDelete: 'CASCADE', nullable: false })
  @JoinColumn({ name: 'team_id', foreignKeyConstraintName: 'FK_foods_team_id' })
  team?: Team;

  @Column({ type: 'varchar', length: 120 })
  name: string;

  @Column({ name: 'protein_g', type: 'double precision' })
  proteinG: number;

  @Column({ name: 'carbohydrate_g', type: 'double precision' })
  carbohydrateG: number;

  @Column({ name: 'fat_g', type: 'double precision' })
  fatG: number;

  @Column({ name: 'fibre_g', type: 'double precision', nullable: true })
  fibreG: number | null;

  @Column({ name: 'alcohol_g', type: 'double precision', nullable: true })
  alcoholG: number | null;

  @Column({ name: 'sodium_mg', type: 'double precision', nullable: true })
  sodiumMg: number | null;

  @Index('IDX_foods_created_by_id')
  @Column({ name: 'created_by_id', type: 'uuid', nullable: true })
  createdById: string | null;

  @ManyToOne(() => User, { onDelete: 'SET NULL', nullable: true })
  @JoinColumn({ name: 'created_by_id', foreignKeyConstraintName: 'FK_foods_created_by_id' })
  createdBy?: User | null;

  /** Set for a personal food: the athlete it belongs to. */
  @Column({ name: 'athlete_id', type: 'uuid', nullable: true })
  athleteId: string | null;

  @ManyToOne(() => Athlete, { onDelete: 'CASCADE', nullable: true })
  @JoinColumn({ name: 'athlete_id', foreignKeyConstraintName: 'FK_foods_athlete_id' })
  athlete?: Athlete | null;

  /** EAN-13 of a product found by its barcode. */
  @Column({ type: 'varchar', length: 13, nullable: true })
  barcode: string | null;

  /** Energy per 100 g as the label prints it, kcal (label and barcode foods). */
  @Column({ name: 'label_energy_kcal', type: 'double precision', nullable: true })
  labelEnergyKcal: number | null;
}
