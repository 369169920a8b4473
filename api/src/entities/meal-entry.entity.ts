import { Check, Column, Entity, Index, JoinColumn, ManyToOne } from 'typeorm';
import { Athlete } from './athlete.entity.js';
import { ClientDayEntry } from './day-record.entity.js';

import type { MealEntryItem } from './meal-entry-item.entity.js';

export type MealSource = 'macros' | 'foods';

/**
 * A meal: typed macros, or foods from the food list (`meal_entry_items`, 1–20). The nutrients
 * are stored as eaten: for foods, the sums of the items as worked out at the time of logging, so a
 * later edit of a team food never rewrites history and the day, trend and drift read this row only.
 */
@Entity({ name: 'meal_entries' })
@Index('UQ_meal_entries_athlete_id_client_id', ['athleteId', 'clientId'], { unique: true })
@Index('IDX_meal_entries_athlete_id_local_date', ['athleteId', 'localDate'])
@Check('CHK_meal_entries_source', `"source" IN ('macros', 'foods')`)
export class MealEntry extends ClientDayEntry {
  @ManyToOne(() => Athlete, { onDelete: 'CASCADE', nullable: false })
  @JoinColumn({ name: 'athlete_id', foreignKeyConstraintName: 'FK_meal_entries_athlete_id' })
  athlete?: Athlete;

  @Column({ type: 'varchar', length: 120 })
  name: string;

  @Column({ type: 'varchar', length: 8 })
  source: MealSource;

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

  @Column({ name: 'energy_kcal', type: 'double precision' })
  energyKcal: number;

  /** Sodium as eaten, mg: typed with macros, or the food's per-100 g value × quantity / 100; null when unknown. */
  @Column({ name: 'sodium_mg', type: 'double precision', nullable: true })
  sodiumMg: number | null;

  /** The foods of a meal of foods, in order; loaded by the meal's readers, not a column. */
  items?: MealEntryItem[];
}
