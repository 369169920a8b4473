import type { MigrationInterface, QueryRunner } from 'typeorm';

/**
 * Plans with versions, guardrail acknowledgements, countdown templates, and sodium on meals.
 * A version's targets and baseline snapshot are jsonb (their shape is the shared zod schema);
 * team guardrail floors live in teams.settings (jsonb), so they need no schema change.
 * Generated with `migration:generate`, then tidied with the foreign keys inline.
 */
export class AddPlans1796173077550 implements MigrationInterface {
  name = 'AddPlans1796173077550';

  public async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`
      CREATE TABLE "plan_versions" (
        "id" uuid NOT NULL DEFAULT gen_random_uuid(),
        "created_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(),
        "updated_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(),
        "athlete_id" uuid NOT NULL,
        "number" integer NOT NULL,
        "effective_from" date NOT NULL,
        "reason" character varying(300) NOT NULL,
        "content" jsonb NOT NULL,
        "baseline" jsonb NOT NULL,
        "created_by_id" uuid NOT NULL,
        CONSTRAINT "PK_plan_versions" PRIMARY KEY ("id"),
        CONSTRAINT "FK_plan_versions_athlete_id" FOREIGN KEY ("athlete_id") REFERENCES "athletes"("id") ON DELETE CASCADE,
        CONSTRAINT "FK_plan_versions_created_by_id" FOREIGN KEY ("created_by_id") REFERENCES "users"("id") ON DELETE RESTRICT
      )`);
    await queryRunner.query(
      `CREATE UNIQUE INDEX "UQ_plan_versions_athlete_id_number" ON "plan_versions" ("athlete_id", "number")`,
    );
    await queryRunner.query(
      `CREATE INDEX "IDX_plan_versions_created_by_id" ON "plan_versions" ("created_by_id")`,
    );

    await queryRunner.query(`
      CREATE TABLE "guardrail_acknowledgements" (
        "id" uuid NOT NULL DEFAULT gen_random_uuid(),
        "created_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(),
        "updated_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(),
        "plan_version_id" uuid NOT NULL,
        "athlete_id" uuid NOT NULL,
        "key" character varying(120) NOT NULL,
        "code" character varying(32) NOT NULL,
        "severity" character varying(8) NOT NULL,
        "scope" jsonb NOT NULL,
        "message" text NOT NULL,
        "source" text NOT NULL,
        "acknowledged_by_id" uuid NOT NULL,
        "acknowledged_at" TIMESTAMP WITH TIME ZONE NOT NULL,
        CONSTRAINT "PK_guardrail_acknowledgements" PRIMARY KEY ("id"),
        CONSTRAINT "CHK_guardrail_acknowledgements_severity" CHECK ("severity" IN ('warning', 'strong')),
        CONSTRAINT "FK_guardrail_acknowledgements_plan_version_id" FOREIGN KEY ("plan_version_id") REFERENCES "plan_versions"("id") ON DELETE CASCADE,
        CONSTRAINT "FK_guardrail_acknowledgements_athlete_id" FOREIGN KEY ("athlete_id") REFERENCES "athletes"("id") ON DELETE CASCADE,
        CONSTRAINT "FK_guardrail_acknowledgements_acknowledged_by_id" FOREIGN KEY ("acknowledged_by_id") REFERENCES "users"("id") ON DELETE RESTRICT
      )`);
    await queryRunner.query(
      `CREATE UNIQUE INDEX "UQ_guardrail_acknowledgements_plan_version_id_key" ON "guardrail_acknowledgements" ("plan_version_id", "key")`,
    );
    await queryRunner.query(
      `CREATE INDEX "IDX_guardrail_acknowledgements_athlete_id" ON "guardrail_acknowledgements" ("athlete_id")`,
    );
    await queryRunner.query(
      `CREATE INDEX "IDX_guardrail_acknowledgements_acknowledged_by_id" ON "guardrail_acknowledgements" ("acknowledged_by_id")`,
    );

    await queryRunner.query(`
      CREATE TABLE "countdown_templates" (
        "id" uuid NOT NULL DEFAULT gen_random_uuid(),
        "created_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(),
        "updated_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(),
        "team_id" uuid NOT NULL,
        "name" character varying(80) NOT NULL,
        "event_type" character varying(16) NOT NULL,
        "description" character varying(1000),
        "days" jsonb NOT NULL,
        "created_by_id" uuid NOT NULL,
        CONSTRAINT "PK_countdown_templates" PRIMARY KEY ("id"),
        CONSTRAINT "CHK_countdown_templates_event_type" CHECK ("event_type" IN ('show', 'shoot', 'weigh_in', 'none')),
        CONSTRAINT "FK_countdown_templates_team_id" FOREIGN KEY ("team_id") REFERENCES "teams"("id") ON DELETE CASCADE,
        CONSTRAINT "FK_countdown_templates_created_by_id" FOREIGN KEY ("created_by_id") REFERENCES "users"("id") ON DELETE RESTRICT
      )`);
    await queryRunner.query(
      `CREATE INDEX "IDX_countdown_templates_team_id" ON "countdown_templates" ("team_id")`,
    );
    await queryRunner.query(
      `CREATE INDEX "IDX_countdown_templates_created_by_id" ON "countdown_templates" ("created_by_id")`,
    );

    await queryRunner.query(`ALTER TABLE "meal_entries" ADD "sodium_mg" double precision`);
  }

  public async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`ALTER TABLE "meal_entries" DROP COLUMN "sodium_mg"`);
    await queryRunner.query(`DROP TABLE "countdown_templates"`);
    await queryRunner.query(`DROP TABLE "guardrail_acknowledgements"`);
    await queryRunner.query(`DROP TABLE "plan_versions"`);
  }
}
