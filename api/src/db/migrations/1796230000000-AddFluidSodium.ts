import type { MigrationInterface, QueryRunner } from 'typeorm';

/** Sodium a drink carried (a recovery drink ticked after a weigh-in logs it); null when unknown. */
export class AddFluidSodium1796230000000 implements MigrationInterface {
  name = 'AddFluidSodium1796230000000';

  public async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`ALTER TABLE "fluid_entries" ADD "sodium_mg" double precision`);
  }

  public async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`ALTER TABLE "fluid_entries" DROP COLUMN "sodium_mg"`);
  }
}
