import type { MigrationInterface, QueryRunner } from 'typeorm';

/** Practice cuts: a cut plan marked as a rehearsal, its day notes, and the severe acknowledgement. */
export class AddCutRehearsals1796220000000 implements MigrationInterface {
  name = 'AddCutRehearsals1796220000000';

  public async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`ALTER TABLE "cut_plans" ADD "rehearsal" boolean NOT NULL DEFAULT false`);
    await queryRunner.query(
      `ALTER TABLE "cut_plan_acknowledgements" DROP CONSTRAINT "CHK_cut_plan_acknowledgements_severity"`,
    );
    // The second acknowledgement above 7 % is stored as what it is: severe.
    await queryRunner.query(
      `UPDATE "cut_plan_acknowledgements" SET "severity" = 'severe' WHERE "key" = 'acute_share_severe'`,
    );
    await queryRunner.query(
      `ALTER TABLE "cut_plan_acknowledgements" ADD CONSTRAINT "CHK_cut_plan_acknowledgements_severity" CHECK ("severity" IN ('warning', 'strong', 'severe'))`,
    );
    await queryRunner.query(`
      CREATE TABLE "cut_rehearsal_notes" (
        "id" uuid NOT NULL DEFAULT gen_random_uuid(),
        "created_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(),
        "updated_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(),
        "cut_plan_id" uuid NOT NULL,
        "athlete_id" uuid NOT NULL,
        "local_date" date NOT NULL,
        "note" text NOT NULL,
        "author_id" uuid,
        CONSTRAINT "PK_cut_rehearsal_notes" PRIMARY KEY ("id")
      )`);
    await queryRunner.query(
      `CREATE UNIQUE INDEX "UQ_cut_rehearsal_notes_cut_plan_id_local_date" ON "cut_rehearsal_notes" ("cut_plan_id", "local_date")`,
    );
    await queryRunner.query(
      `CREATE INDEX "IDX_cut_rehearsal_notes_athlete_id" ON "cut_rehearsal_notes" ("athlete_id")`,
    );
    await queryRunner.query(
      `CREATE INDEX "IDX_cut_rehearsal_notes_author_id" ON "cut_rehearsal_notes" ("author_id")`,
    );
    await queryRunner.query(
      `ALTER TABLE "cut_rehearsal_notes" ADD CONSTRAINT "FK_cut_rehearsal_notes_cut_plan_id" FOREIGN KEY ("cut_plan_id") REFERENCES "cut_plans"("id") ON DELETE CASCADE ON UPDATE NO ACTION`,
    );
    await queryRunner.query(
      `ALTER TABLE "cut_rehearsal_notes" ADD CONSTRAINT "FK_cut_rehearsal_notes_athlete_id" FOREIGN KEY ("athlete_id") REFERENCES "athletes"("id") ON DELETE CASCADE ON UPDATE NO ACTION`,
    );
    await queryRunner.query(
      `ALTER TABLE "cut_rehearsal_notes" ADD CONSTRAINT "FK_cut_rehearsal_notes_author_id" FOREIGN KEY ("author_id") REFERENCES "users"("id") ON DELETE SET NULL ON UPDATE NO ACTION`,
    );
  }

  public async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`DROP TABLE "cut_rehearsal_notes"`);
    await queryRunner.query(
      `ALTER TABLE "cut_plan_acknowledgements" DROP CONSTRAINT "CHK_cut_plan_acknowledgements_severity"`,
    );
    await queryRunner.query(
      `UPDATE "cut_plan_acknowledgements" SET "severity" = 'strong' WHERE "severity" = 'severe'`,
    );
    await queryRunner.query(
      `ALTER TABLE "cut_plan_acknowledgements" ADD CONSTRAINT "CHK_cut_plan_acknowledgements_severity" CHECK ("severity" IN ('warning', 'strong'))`,
    );
    await queryRunner.query(`ALTER TABLE "cut_plans" DROP COLUMN "rehearsal"`);
  }
}
