import { Column, Entity, Index, JoinColumn, ManyToOne } from 'typeorm';
import { BaseRecord } from './base.entity.js';
import { Team } from './team.entity.js';
import { User } from './user.entity.js';

/** A team's own food, nutrients per 100 g (energy follows from the Atwater factors). */
@Entity({ name: 'foods' })
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
}
