import type { MigrationInterface, QueryRunner } from 'typeorm';

/** Rate-limit counters in PostgreSQL (they were in each process's memory and reset on restart). */
export class AddRateLimitCounters1796190000000 implements MigrationInterface {
  name = 'AddRateLimitCounters1796190000000';

  public async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`
      CREATE TABLE "rate_limit_counters" (
        "id" uuid NOT NULL DEFAULT gen_random_uuid(),
        "created_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(),
        "updated_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(),
        "key" character varying(400) NOT NULL,
        "hits" integer NOT NULL,
        "reset_at" TIMESTAMP WITH TIME ZONE NOT NULL,
        CONSTRAINT "PK_rate_limit_counters" PRIMARY KEY ("id")
      )`);
    await queryRunner.query(
      `CREATE UNIQUE INDEX "UQ_rate_limit_counters_key" ON "rate_limit_counters" ("key")`,
    );
    await queryRunner.query(
      `CREATE INDEX "IDX_rate_limit_counters_reset_at" ON "rate_limit_counters" ("reset_at")`,
    );
  }

  public async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`DROP INDEX "public"."IDX_rate_limit_counters_reset_at"`);
    await queryRunner.query(`DROP INDEX "public"."UQ_rate_limit_counters_key"`);
    await queryRunner.query(`DROP TABLE "rate_limit_counters"`);
  }
}
