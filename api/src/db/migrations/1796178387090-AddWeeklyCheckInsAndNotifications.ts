import type { MigrationInterface, QueryRunner } from 'typeorm';

/**
 * Issue 6 in one migration: weekly check-ins (one per athlete and due date, with the coach's reply
 * on the row), each athlete's check-in weekday, users' e-mail preferences, and notification_sends,
 * whose unique (user, kind, due key) makes a scheduled e-mail go out once per due time, and extra
 * mail headers on the outbox (List-Unsubscribe). Check-ins
 * cascade from the athlete; the replying staff member is RESTRICT like other authors; a linked plan
 * version is cleared if it goes. Generated with `migration:generate`, then tidied with the foreign
 * keys inline.
 */
export class AddWeeklyCheckInsAndNotifications1796178387090 implements MigrationInterface {
  name = 'AddWeeklyCheckInsAndNotifications1796178387090';

  public async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`
      CREATE TABLE "weekly_check_ins" (
        "id" uuid NOT NULL DEFAULT gen_random_uuid(),
        "created_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(),
        "updated_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(),
        "athlete_id" uuid NOT NULL,
        "due_date" date NOT NULL,
        "questions" jsonb NOT NULL DEFAULT '[]',
        "answers" jsonb NOT NULL DEFAULT '[]',
        "questions_for_coach" text,
        "figures" jsonb NOT NULL,
        "submitted_at" TIMESTAMP WITH TIME ZONE NOT NULL,
        "reply_body" text,
        "replied_by_id" uuid,
        "replied_at" TIMESTAMP WITH TIME ZONE,
        "plan_version_id" uuid,
        CONSTRAINT "PK_weekly_check_ins" PRIMARY KEY ("id"),
        CONSTRAINT "FK_weekly_check_ins_athlete_id" FOREIGN KEY ("athlete_id") REFERENCES "athletes"("id") ON DELETE CASCADE,
        CONSTRAINT "FK_weekly_check_ins_replied_by_id" FOREIGN KEY ("replied_by_id") REFERENCES "users"("id") ON DELETE RESTRICT,
        CONSTRAINT "FK_weekly_check_ins_plan_version_id" FOREIGN KEY ("plan_version_id") REFERENCES "plan_versions"("id") ON DELETE SET NULL
      )`);
    await queryRunner.query(
      `CREATE UNIQUE INDEX "UQ_weekly_check_ins_athlete_id_due_date" ON "weekly_check_ins" ("athlete_id", "due_date")`,
    );
    await queryRunner.query(
      `CREATE INDEX "IDX_weekly_check_ins_replied_by_id" ON "weekly_check_ins" ("replied_by_id")`,
    );
    await queryRunner.query(
      `CREATE INDEX "IDX_weekly_check_ins_plan_version_id" ON "weekly_check_ins" ("plan_version_id")`,
    );

    await queryRunner.query(`
      CREATE TABLE "notification_sends" (
        "id" uuid NOT NULL DEFAULT gen_random_uuid(),
        "created_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(),
        "updated_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(),
        "user_id" uuid NOT NULL,
        "kind" character varying(32) NOT NULL,
        "due_key" character varying(64) NOT NULL,
        CONSTRAINT "PK_notification_sends" PRIMARY KEY ("id"),
        CONSTRAINT "FK_notification_sends_user_id" FOREIGN KEY ("user_id") REFERENCES "users"("id") ON DELETE CASCADE
      )`);
    await queryRunner.query(
      `CREATE UNIQUE INDEX "UQ_notification_sends_user_id_kind_due_key" ON "notification_sends" ("user_id", "kind", "due_key")`,
    );

    await queryRunner.query(
      `ALTER TABLE "athletes" ADD "check_in_weekday" character varying(3) NOT NULL DEFAULT 'mon'`,
    );
    await queryRunner.query(
      `ALTER TABLE "athletes" ADD CONSTRAINT "CHK_athletes_check_in_weekday" CHECK ("check_in_weekday" IN ('mon', 'tue', 'wed', 'thu', 'fri', 'sat', 'sun'))`,
    );
    await queryRunner.query(`ALTER TABLE "users" ADD "notification_prefs" jsonb NOT NULL DEFAULT '{}'`);
    await queryRunner.query(`ALTER TABLE "outbox_messages" ADD "headers" jsonb`);
  }

  public async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`ALTER TABLE "outbox_messages" DROP COLUMN "headers"`);
    await queryRunner.query(`ALTER TABLE "users" DROP COLUMN "notification_prefs"`);
    await queryRunner.query(`ALTER TABLE "athletes" DROP CONSTRAINT "CHK_athletes_check_in_weekday"`);
    await queryRunner.query(`ALTER TABLE "athletes" DROP COLUMN "check_in_weekday"`);
    await queryRunner.query(`DROP TABLE "notification_sends"`);
    await queryRunner.query(`DROP TABLE "weekly_check_ins"`);
  }
}
