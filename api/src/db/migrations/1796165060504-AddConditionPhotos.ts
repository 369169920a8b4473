import type { MigrationInterface, QueryRunner } from 'typeorm';

/**
 * Condition photos: one row per photo, naming the two stored sizes by their random storage keys.
 * The team's pose list lives in teams.settings (jsonb), so it needs no schema change.
 * Generated with `migration:generate`, then tidied with the foreign key inline.
 */
export class AddConditionPhotos1796165060504 implements MigrationInterface {
  name = 'AddConditionPhotos1796165060504';

  public async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`
      CREATE TABLE "condition_photos" (
        "id" uuid NOT NULL DEFAULT gen_random_uuid(),
        "created_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(),
        "updated_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(),
        "athlete_id" uuid NOT NULL,
        "local_date" date NOT NULL,
        "pose" character varying(60) NOT NULL,
        "width" integer NOT NULL,
        "height" integer NOT NULL,
        "thumb_key" character varying(200) NOT NULL,
        "display_key" character varying(200) NOT NULL,
        "content_type" character varying(40) NOT NULL,
        "bytes" integer NOT NULL,
        "content_hash" character(64) NOT NULL,
        CONSTRAINT "PK_condition_photos" PRIMARY KEY ("id"),
        CONSTRAINT "FK_condition_photos_athlete_id" FOREIGN KEY ("athlete_id") REFERENCES "athletes"("id") ON DELETE CASCADE
      )`);
    await queryRunner.query(
      `CREATE INDEX "IDX_condition_photos_athlete_id_local_date" ON "condition_photos" ("athlete_id", "local_date")`,
    );
    await queryRunner.query(
      `CREATE UNIQUE INDEX "UQ_condition_photos_athlete_id_local_date_pose_content_hash" ON "condition_photos" ("athlete_id", "local_date", "pose", "content_hash")`,
    );
  }

  public async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`DROP TABLE "condition_photos"`);
  }
}
