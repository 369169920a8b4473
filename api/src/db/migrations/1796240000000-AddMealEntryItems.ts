import type { MigrationInterface, QueryRunner } from 'typeorm';

/**
 * Several foods per meal: `meal_entry_items` holds each food as eaten; a meal of one food (source
 * 'food', its food in columns of the meal) becomes a meal of foods with one item, and those
 * columns go. `down()` turns meals of exactly one item back into the old shape and refuses when a
 * meal holds more (it would lose foods).
 */
export class AddMealEntryItems1796240000000 implements MigrationInterface {
  name = 'AddMealEntryItems1796240000000';

  public async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`
      CREATE TABLE "meal_entry_items" (
        "id" uuid NOT NULL DEFAULT gen_random_uuid(),
        "created_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(),
        "updated_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(),
        "meal_entry_id" uuid NOT NULL,
        "athlete_id" uuid NOT NULL,
        "position" smallint NOT NULL,
        "food_id" character varying(64) NOT NULL,
        "food_name" character varying(200) NOT NULL,
        "quantity_g" double precision NOT NULL,
        "portion_count" double precision,
        "portion_unit" character varying(32),
        "portion_label" character varying(64),
        "portion_g" double precision,
        "protein_g" double precision NOT NULL,
        "carbohydrate_g" double precision NOT NULL,
        "fat_g" double precision NOT NULL,
        "fibre_g" double precision,
        "alcohol_g" double precision,
        "energy_kcal" double precision NOT NULL,
        "sodium_mg" double precision,
        CONSTRAINT "PK_meal_entry_items" PRIMARY KEY ("id")
      )`);
    await queryRunner.query(
      `CREATE INDEX "IDX_meal_entry_items_meal_entry_id" ON "meal_entry_items" ("meal_entry_id", "position")`,
    );
    await queryRunner.query(
      `CREATE INDEX "IDX_meal_entry_items_athlete_id_food_id" ON "meal_entry_items" ("athlete_id", "food_id")`,
    );
    await queryRunner.query(
      `ALTER TABLE "meal_entry_items" ADD CONSTRAINT "FK_meal_entry_items_meal_entry_id" FOREIGN KEY ("meal_entry_id") REFERENCES "meal_entries"("id") ON DELETE CASCADE ON UPDATE NO ACTION`,
    );
    await queryRunner.query(
      `ALTER TABLE "meal_entry_items" ADD CONSTRAINT "FK_meal_entry_items_athlete_id" FOREIGN KEY ("athlete_id") REFERENCES "athletes"("id") ON DELETE CASCADE ON UPDATE NO ACTION`,
    );
    // Each single-food meal becomes a meal of foods with that one item, its figures as stored.
    await queryRunner.query(`
      INSERT INTO "meal_entry_items" ("meal_entry_id", "athlete_id", "position", "food_id", "food_name",
        "quantity_g", "protein_g", "carbohydrate_g", "fat_g", "fibre_g", "alcohol_g", "energy_kcal", "sodium_mg")
      SELECT "id", "athlete_id", 0, "food_id", "food_name", "quantity_g", "protein_g", "carbohydrate_g",
        "fat_g", "fibre_g", "alcohol_g", "energy_kcal", "sodium_mg"
        FROM "meal_entries" WHERE "source" = 'food'`);
    await queryRunner.query(`ALTER TABLE "meal_entries" DROP CONSTRAINT "CHK_meal_entries_food"`);
    await queryRunner.query(`ALTER TABLE "meal_entries" DROP CONSTRAINT "CHK_meal_entries_source"`);
    await queryRunner.query(`UPDATE "meal_entries" SET "source" = 'foods' WHERE "source" = 'food'`);
    await queryRunner.query(
      `ALTER TABLE "meal_entries" ADD CONSTRAINT "CHK_meal_entries_source" CHECK ("source" IN ('macros', 'foods'))`,
    );
    await queryRunner.query(`ALTER TABLE "meal_entries" DROP COLUMN "food_id"`);
    await queryRunner.query(`ALTER TABLE "meal_entries" DROP COLUMN "food_name"`);
    await queryRunner.query(`ALTER TABLE "meal_entries" DROP COLUMN "quantity_g"`);
  }

  public async down(queryRunner: QueryRunner): Promise<void> {
    const [{ n }] = await queryRunner.query(
      `SELECT count(*)::int AS n FROM (SELECT 1 FROM "meal_entry_items" GROUP BY "meal_entry_id" HAVING count(*) > 1) t`,
    );
    if (n > 0) throw new Error(`${n} meals hold more than one food: the old shape cannot hold them`);
    await queryRunner.query(`ALTER TABLE "meal_entries" ADD "quantity_g" double precision`);
    await queryRunner.query(`ALTER TABLE "meal_entries" ADD "food_name" character varying(200)`);
    await queryRunner.query(`ALTER TABLE "meal_entries" ADD "food_id" character varying(64)`);
    await queryRunner.query(`
      UPDATE "meal_entries" m SET "food_id" = i."food_id", "food_name" = i."food_name", "quantity_g" = i."quantity_g"
        FROM "meal_entry_items" i WHERE i."meal_entry_id" = m."id"`);
    await queryRunner.query(`ALTER TABLE "meal_entries" DROP CONSTRAINT "CHK_meal_entries_source"`);
    await queryRunner.query(`UPDATE "meal_entries" SET "source" = 'food' WHERE "source" = 'foods'`);
    await queryRunner.query(
      `ALTER TABLE "meal_entries" ADD CONSTRAINT "CHK_meal_entries_source" CHECK ("source" IN ('macros', 'food'))`,
    );
    await queryRunner.query(
      `ALTER TABLE "meal_entries" ADD CONSTRAINT "CHK_meal_entries_food" CHECK ("source" = 'macros' OR ("food_id" IS NOT NULL AND "food_name" IS NOT NULL AND "quantity_g" IS NOT NULL))`,
    );
    await queryRunner.query(`DROP TABLE "meal_entry_items"`);
  }
}
