import type { MigrationInterface, QueryRunner } from 'typeorm';

/**
 * Marks pinned to an athlete's charts, their reply threads and per-reader read state, and the
 * review queue's "last reviewed" per athlete and reviewer. Everything cascades from the athlete
 * (and a mark's replies and reads from the mark); authors are RESTRICT like a plan's author.
 * Generated with `migration:generate`, then tidied with the foreign keys inline.
 */
export class AddMarksAndReviews1796175671267 implements MigrationInterface {
  name = 'AddMarksAndReviews1796175671267';

  public async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`
      CREATE TABLE "marks" (
        "id" uuid NOT NULL DEFAULT gen_random_uuid(),
        "created_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(),
        "updated_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(),
        "athlete_id" uuid NOT NULL,
        "author_id" uuid NOT NULL,
        "metric" character varying(16) NOT NULL,
        "from_date" date NOT NULL,
        "to_date" date NOT NULL,
        "note" text NOT NULL,
        CONSTRAINT "PK_marks" PRIMARY KEY ("id"),
        CONSTRAINT "CHK_marks_metric" CHECK ("metric" IN ('weight', 'fluids', 'energy', 'macros', 'general')),
        CONSTRAINT "CHK_marks_range" CHECK ("to_date" >= "from_date"),
        CONSTRAINT "FK_marks_athlete_id" FOREIGN KEY ("athlete_id") REFERENCES "athletes"("id") ON DELETE CASCADE,
        CONSTRAINT "FK_marks_author_id" FOREIGN KEY ("author_id") REFERENCES "users"("id") ON DELETE RESTRICT
      )`);
    await queryRunner.query(
      `CREATE INDEX "IDX_marks_athlete_id_from_date" ON "marks" ("athlete_id", "from_date")`,
    );
    await queryRunner.query(`CREATE INDEX "IDX_marks_author_id" ON "marks" ("author_id")`);

    await queryRunner.query(`
      CREATE TABLE "mark_replies" (
        "id" uuid NOT NULL DEFAULT gen_random_uuid(),
        "created_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(),
        "updated_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(),
        "mark_id" uuid NOT NULL,
        "author_id" uuid NOT NULL,
        "body" text NOT NULL,
        CONSTRAINT "PK_mark_replies" PRIMARY KEY ("id"),
        CONSTRAINT "FK_mark_replies_mark_id" FOREIGN KEY ("mark_id") REFERENCES "marks"("id") ON DELETE CASCADE,
        CONSTRAINT "FK_mark_replies_author_id" FOREIGN KEY ("author_id") REFERENCES "users"("id") ON DELETE RESTRICT
      )`);
    await queryRunner.query(
      `CREATE INDEX "IDX_mark_replies_mark_id_created_at" ON "mark_replies" ("mark_id", "created_at")`,
    );
    await queryRunner.query(`CREATE INDEX "IDX_mark_replies_author_id" ON "mark_replies" ("author_id")`);

    await queryRunner.query(`
      CREATE TABLE "mark_reads" (
        "id" uuid NOT NULL DEFAULT gen_random_uuid(),
        "created_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(),
        "updated_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(),
        "mark_id" uuid NOT NULL,
        "user_id" uuid NOT NULL,
        "read_at" TIMESTAMP WITH TIME ZONE NOT NULL,
        CONSTRAINT "PK_mark_reads" PRIMARY KEY ("id"),
        CONSTRAINT "FK_mark_reads_mark_id" FOREIGN KEY ("mark_id") REFERENCES "marks"("id") ON DELETE CASCADE,
        CONSTRAINT "FK_mark_reads_user_id" FOREIGN KEY ("user_id") REFERENCES "users"("id") ON DELETE CASCADE
      )`);
    await queryRunner.query(
      `CREATE UNIQUE INDEX "UQ_mark_reads_mark_id_user_id" ON "mark_reads" ("mark_id", "user_id")`,
    );
    await queryRunner.query(`CREATE INDEX "IDX_mark_reads_user_id" ON "mark_reads" ("user_id")`);

    await queryRunner.query(`
      CREATE TABLE "athlete_reviews" (
        "id" uuid NOT NULL DEFAULT gen_random_uuid(),
        "created_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(),
        "updated_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(),
        "athlete_id" uuid NOT NULL,
        "reviewer_id" uuid NOT NULL,
        "reviewed_at" TIMESTAMP WITH TIME ZONE NOT NULL,
        CONSTRAINT "PK_athlete_reviews" PRIMARY KEY ("id"),
        CONSTRAINT "FK_athlete_reviews_athlete_id" FOREIGN KEY ("athlete_id") REFERENCES "athletes"("id") ON DELETE CASCADE,
        CONSTRAINT "FK_athlete_reviews_reviewer_id" FOREIGN KEY ("reviewer_id") REFERENCES "users"("id") ON DELETE CASCADE
      )`);
    await queryRunner.query(
      `CREATE UNIQUE INDEX "UQ_athlete_reviews_athlete_id_reviewer_id" ON "athlete_reviews" ("athlete_id", "reviewer_id")`,
    );
    await queryRunner.query(
      `CREATE INDEX "IDX_athlete_reviews_reviewer_id" ON "athlete_reviews" ("reviewer_id")`,
    );
  }

  public async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`DROP TABLE "athlete_reviews"`);
    await queryRunner.query(`DROP TABLE "mark_reads"`);
    await queryRunner.query(`DROP TABLE "mark_replies"`);
    await queryRunner.query(`DROP TABLE "marks"`);
  }
}
