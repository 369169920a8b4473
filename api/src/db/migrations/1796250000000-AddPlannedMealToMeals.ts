import type { MigrationInterface, QueryRunner } from 'typeorm';

/** A meal entry may log a planned meal of the day's meal plan (its id in the plan version). */
export class AddPlannedMealToMeals1796250000000 implements MigrationInterface {
  name = 'AddPlannedMealToMeals1796250000000';

  public async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`ALTER TABLE "meal_entries" ADD "planned_meal_id" uuid`);
  }

  public async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`ALTER TABLE "meal_entries" DROP COLUMN "planned_meal_id"`);
  }
}
