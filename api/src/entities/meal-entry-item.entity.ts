import { Column, Entity, Index, JoinColumn, ManyToOne } from 'typeorm';
import { Athlete } from './athlete.entity.js';
import { BaseRecord } from './base.entity.js';
import { MealEntry } from './meal-entry.entity.js';

/**
 * One food of a meal, as eaten: grams (typed, or portions × the portion's weight then) and every
 * nutrient worked out when logged, so a later edit of a team food never rewrites history. The meal
 * row keeps the sums (the trend, drift and day views read only meal_entries).
 */
@Entity({ name: 'meal_entry_items' })
@Index('IDX_meal_entry_items_meal_entry_id', ['mealEntryId', 'position'])
@Index('IDX_meal_entry_items_athlete_id_food_id', ['athleteId', 'foodId'])
export class MealEntryItem extends BaseRecord {
  @Column({ name: 'meal_entry_id', type: 'uuid' })
  mealEntryId: string;

  @ManyToOne(() => MealEntry, { onDelete: 'CASCADE', nullable: false })
  @JoinColumn({ name: 'meal_entry_id', foreignKeyConstraintName: 'FK_meal_entry_items_meal_entry_id' })
  mealEntry?: MealEntry;

  /** The meal's athlete, kept here for the usage counts behind search and the data archive. */
  @Column({ name: 'athlete_id', type: 'uuid' })
  athleteId: string;

  @ManyToOne(() => Athlete, { onDelete: 'CASCADE', nullable: false })
  @JoinColumn({ name: 'athlete_id', foreignKeyConstraintName: 'FK_meal_entry_items_athlete_id' })
  athlete?: Athlete;

  /** Order in the meal, from 0. */
  @Column({ type: 'smallint' })
  position: number;

  /**
   * A team food's uuid, a reference food's `ifct:<code>` or an everyday food's `dm:<slug>`. No
   * foreign key: reference and everyday foods live in code, and a deleted team food leaves the meal
   * as it was.
   */
  @Column({ name: 'food_id', type: 'varchar', length: 64 })
  foodId: string;

  @Column({ name: 'food_name', type: 'varchar', length: 200 })
  foodName: string;

  /** Grams eaten. */
  @Column({ name: 'quantity_g', type: 'double precision' })
  quantityG: number;

  /** Portions typed (with unit, label and weight then); null when typed in grams. */
  @Column({ name: 'portion_count', type: 'double precision', nullable: true })
  portionCount: number | null;

  @Column({ name: 'portion_unit', type: 'varchar', length: 32, nullable: true })
  portionUnit: string | null;

  @Column({ name: 'portion_label', type: 'varchar', length: 64, nullable: true })
  portionLabel: string | null;

  @Column({ name: 'portion_g', type: 'double precision', nullable: true })
  portionG: number | null;

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

  @Column({ name: 'sodium_mg', type: 'double precision', nullable: true })
  sodiumMg: number | null;
}
