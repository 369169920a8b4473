import type { MigrationInterface, QueryRunner } from 'typeorm';

/** Personal foods (owned by one athlete), a product's barcode and the label's printed energy. */
export class AddFoodLabels1796210000000 implements MigrationInterface {
  name = 'AddFoodLabels1796210000000';

  public async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`ALTER TABLE "foods" ADD "athlete_id" uuid`);
    await queryRunner.query(`ALTER TABLE "foods" ADD "barcode" character varying(13)`);
    await queryRunner.query(`ALTER TABLE "foods" ADD "label_energy_kcal" double precision`);
    await queryRunner.query(
      `CREATE INDEX "IDX_foods_athlete_id_barcode" ON "foods" ("athlete_id", "barcode")`,
    );
    await queryRunner.query(
      `ALTER TABLE "foods" ADD CONSTRAINT "FK_foods_athlete_id" FOREIGN KEY ("athlete_id") REFERENCES "athletes"("id") ON DELETE CASCADE ON UPDATE NO ACTION`,
    );
  }

  public async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`ALTER TABLE "foods" DROP CONSTRAINT "FK_foods_athlete_id"`);
    await queryRunner.query(`DROP INDEX "public"."IDX_foods_athlete_id_barcode"`);
    await queryRunner.query(`ALTER TABLE "foods" DROP COLUMN "label_energy_kcal"`);
    await queryRunner.query(`ALTER TABLE "foods" DROP COLUMN "barcode"`);
    await queryRunner.query(`ALTER TABLE "foods" DROP COLUMN "athlete_id"`);
  }
}
