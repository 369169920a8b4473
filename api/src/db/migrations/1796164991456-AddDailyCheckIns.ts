import type { MigrationInterface, QueryRunner } from 'typeorm';

/**
 * The daily check-in: team foods, weigh-ins and evening logs (one per athlete and day), fluid,
 * meal, supplement and symptom entries (unique client ids for idempotent creates), and safety
 * flags for the coach. Generated with `migration:generate`, then regrouped by table with
 * foreign keys inline. Every table is read by (athlete_id, local_date).
 */
export class AddDailyCheckIns1796164991456 implements MigrationInterface {
  name = 'AddDailyCheckIns1796164991456';

  public async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`
      CREATE TABLE "foods" (
        "id" uuid NOT NULL DEFAULT gen_random_uuid(),
        "created_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(),
        "updated_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(),
        "team_id" uuid NOT NULL,
        "name" character varying(120) NOT NULL,
        "protein_g" double precision NOT NULL,
        "carbohydrate_g" double precision NOT NULL,
        "fat_g" double precision NOT NULL,
        "fibre_g" double precision,
        "alcohol_g" double precision,
        "sodium_mg" double precision,
        "created_by_id" uuid,
        CONSTRAINT "PK_foods" PRIMARY KEY ("id"),
        CONSTRAINT "FK_foods_team_id" FOREIGN KEY ("team_id") REFERENCES "teams"("id") ON DELETE CASCADE,
        CONSTRAINT "FK_foods_created_by_id" FOREIGN KEY ("created_by_id") REFERENCES "users"("id") ON DELETE SET NULL
      )`);
    await queryRunner.query(`CREATE INDEX "IDX_foods_team_id" ON "foods" ("team_id")`);
    await queryRunner.query(`CREATE INDEX "IDX_foods_created_by_id" ON "foods" ("created_by_id")`);

    await queryRunner.query(`
      CREATE TABLE "weigh_ins" (
        "id" uuid NOT NULL DEFAULT gen_random_uuid(),
        "created_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(),
        "updated_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(),
        "athlete_id" uuid NOT NULL,
        "local_date" date NOT NULL,
        "local_time" character varying(5) NOT NULL,
        "logged_at" TIMESTAMP WITH TIME ZONE NOT NULL,
        "weight_kg" double precision NOT NULL,
        "entered_value" double precision NOT NULL,
        "entered_unit" character varying(4) NOT NULL,
        "protocol_confirmed" boolean NOT NULL,
        "tags" jsonb NOT NULL DEFAULT '[]',
        "cycle_phase" character varying(16),
        CONSTRAINT "PK_weigh_ins" PRIMARY KEY ("id"),
        CONSTRAINT "FK_weigh_ins_athlete_id" FOREIGN KEY ("athlete_id") REFERENCES "athletes"("id") ON DELETE CASCADE,
        CONSTRAINT "CHK_weigh_ins_entered_unit" CHECK ("entered_unit" IN ('kg', 'lb')),
        CONSTRAINT "CHK_weigh_ins_cycle_phase" CHECK ("cycle_phase" IS NULL OR "cycle_phase" IN ('menstrual', 'follicular', 'ovulation', 'luteal')),
        CONSTRAINT "CHK_weigh_ins_weight_kg" CHECK ("weight_kg" > 0)
      )`);
    // One weigh-in per day; the unique pair also serves reads by (athlete_id, local_date).
    await queryRunner.query(
      `CREATE UNIQUE INDEX "UQ_weigh_ins_athlete_id_local_date" ON "weigh_ins" ("athlete_id", "local_date")`,
    );

    await queryRunner.query(`
      CREATE TABLE "fluid_entries" (
        "id" uuid NOT NULL DEFAULT gen_random_uuid(),
        "created_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(),
        "updated_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(),
        "athlete_id" uuid NOT NULL,
        "local_date" date NOT NULL,
        "local_time" character varying(5) NOT NULL,
        "logged_at" TIMESTAMP WITH TIME ZONE NOT NULL,
        "client_id" uuid NOT NULL,
        "volume_ml" double precision NOT NULL,
        "entered_value" double precision NOT NULL,
        "entered_unit" character varying(4) NOT NULL,
        "kind" character varying(16) NOT NULL,
        CONSTRAINT "PK_fluid_entries" PRIMARY KEY ("id"),
        CONSTRAINT "FK_fluid_entries_athlete_id" FOREIGN KEY ("athlete_id") REFERENCES "athletes"("id") ON DELETE CASCADE,
        CONSTRAINT "CHK_fluid_entries_entered_unit" CHECK ("entered_unit" IN ('ml', 'floz')),
        CONSTRAINT "CHK_fluid_entries_kind" CHECK ("kind" IN ('water', 'coffee_tea', 'other')),
        CONSTRAINT "CHK_fluid_entries_volume_ml" CHECK ("volume_ml" > 0)
      )`);
    await queryRunner.query(
      `CREATE UNIQUE INDEX "UQ_fluid_entries_athlete_id_client_id" ON "fluid_entries" ("athlete_id", "client_id")`,
    );
    await queryRunner.query(
      `CREATE INDEX "IDX_fluid_entries_athlete_id_local_date" ON "fluid_entries" ("athlete_id", "local_date")`,
    );

    await queryRunner.query(`
      CREATE TABLE "meal_entries" (
        "id" uuid NOT NULL DEFAULT gen_random_uuid(),
        "created_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(),
        "updated_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(),
        "athlete_id" uuid NOT NULL,
        "local_date" date NOT NULL,
        "local_time" character varying(5) NOT NULL,
        "logged_at" TIMESTAMP WITH TIME ZONE NOT NULL,
        "client_id" uuid NOT NULL,
        "name" character varying(120) NOT NULL,
        "source" character varying(8) NOT NULL,
        "food_id" character varying(64),
        "food_name" character varying(200),
        "quantity_g" double precision,
        "protein_g" double precision NOT NULL,
        "carbohydrate_g" double precision NOT NULL,
        "fat_g" double precision NOT NULL,
        "fibre_g" double precision,
        "alcohol_g" double precision,
        "energy_kcal" double precision NOT NULL,
        CONSTRAINT "PK_meal_entries" PRIMARY KEY ("id"),
        CONSTRAINT "FK_meal_entries_athlete_id" FOREIGN KEY ("athlete_id") REFERENCES "athletes"("id") ON DELETE CASCADE,
        CONSTRAINT "CHK_meal_entries_source" CHECK ("source" IN ('macros', 'food')),
        CONSTRAINT "CHK_meal_entries_food" CHECK ("source" = 'macros' OR ("food_id" IS NOT NULL AND "food_name" IS NOT NULL AND "quantity_g" IS NOT NULL))
      )`);
    await queryRunner.query(
      `CREATE UNIQUE INDEX "UQ_meal_entries_athlete_id_client_id" ON "meal_entries" ("athlete_id", "client_id")`,
    );
    await queryRunner.query(
      `CREATE INDEX "IDX_meal_entries_athlete_id_local_date" ON "meal_entries" ("athlete_id", "local_date")`,
    );

    await queryRunner.query(`
      CREATE TABLE "supplement_entries" (
        "id" uuid NOT NULL DEFAULT gen_random_uuid(),
        "created_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(),
        "updated_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(),
        "athlete_id" uuid NOT NULL,
        "local_date" date NOT NULL,
        "local_time" character varying(5) NOT NULL,
        "logged_at" TIMESTAMP WITH TIME ZONE NOT NULL,
        "client_id" uuid NOT NULL,
        "name" character varying(80) NOT NULL,
        "dose" double precision,
        "dose_unit" character varying(16),
        "schedule_item_id" uuid,
        CONSTRAINT "PK_supplement_entries" PRIMARY KEY ("id"),
        CONSTRAINT "FK_supplement_entries_athlete_id" FOREIGN KEY ("athlete_id") REFERENCES "athletes"("id") ON DELETE CASCADE
      )`);
    await queryRunner.query(
      `CREATE UNIQUE INDEX "UQ_supplement_entries_athlete_id_client_id" ON "supplement_entries" ("athlete_id", "client_id")`,
    );
    await queryRunner.query(
      `CREATE INDEX "IDX_supplement_entries_athlete_id_local_date" ON "supplement_entries" ("athlete_id", "local_date")`,
    );

    await queryRunner.query(`
      CREATE TABLE "evening_logs" (
        "id" uuid NOT NULL DEFAULT gen_random_uuid(),
        "created_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(),
        "updated_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(),
        "athlete_id" uuid NOT NULL,
        "local_date" date NOT NULL,
        "steps" integer,
        "sleep_hours" double precision,
        "cardio_minutes" double precision,
        "training_done" boolean,
        "training_note" character varying(120),
        "ratings" jsonb NOT NULL DEFAULT '{}',
        "note" character varying(2000),
        CONSTRAINT "PK_evening_logs" PRIMARY KEY ("id"),
        CONSTRAINT "FK_evening_logs_athlete_id" FOREIGN KEY ("athlete_id") REFERENCES "athletes"("id") ON DELETE CASCADE
      )`);
    await queryRunner.query(
      `CREATE UNIQUE INDEX "UQ_evening_logs_athlete_id_local_date" ON "evening_logs" ("athlete_id", "local_date")`,
    );

    await queryRunner.query(`
      CREATE TABLE "symptom_reports" (
        "id" uuid NOT NULL DEFAULT gen_random_uuid(),
        "created_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(),
        "updated_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(),
        "athlete_id" uuid NOT NULL,
        "local_date" date NOT NULL,
        "local_time" character varying(5) NOT NULL,
        "logged_at" TIMESTAMP WITH TIME ZONE NOT NULL,
        "client_id" uuid NOT NULL,
        "symptoms" jsonb NOT NULL,
        "note" character varying(2000),
        "urgent" boolean NOT NULL,
        CONSTRAINT "PK_symptom_reports" PRIMARY KEY ("id"),
        CONSTRAINT "FK_symptom_reports_athlete_id" FOREIGN KEY ("athlete_id") REFERENCES "athletes"("id") ON DELETE CASCADE
      )`);
    await queryRunner.query(
      `CREATE UNIQUE INDEX "UQ_symptom_reports_athlete_id_client_id" ON "symptom_reports" ("athlete_id", "client_id")`,
    );
    await queryRunner.query(
      `CREATE INDEX "IDX_symptom_reports_athlete_id_local_date" ON "symptom_reports" ("athlete_id", "local_date")`,
    );

    await queryRunner.query(`
      CREATE TABLE "athlete_flags" (
        "id" uuid NOT NULL DEFAULT gen_random_uuid(),
        "created_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(),
        "updated_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(),
        "athlete_id" uuid NOT NULL,
        "local_date" date NOT NULL,
        "kind" character varying(16) NOT NULL,
        "message" character varying(300) NOT NULL,
        "detail" jsonb NOT NULL DEFAULT '{}',
        "symptom_report_id" uuid,
        CONSTRAINT "PK_athlete_flags" PRIMARY KEY ("id"),
        CONSTRAINT "FK_athlete_flags_athlete_id" FOREIGN KEY ("athlete_id") REFERENCES "athletes"("id") ON DELETE CASCADE,
        CONSTRAINT "FK_athlete_flags_symptom_report_id" FOREIGN KEY ("symptom_report_id") REFERENCES "symptom_reports"("id") ON DELETE SET NULL,
        CONSTRAINT "CHK_athlete_flags_kind" CHECK ("kind" IN ('symptom'))
      )`);
    await queryRunner.query(
      `CREATE INDEX "IDX_athlete_flags_athlete_id_local_date" ON "athlete_flags" ("athlete_id", "local_date")`,
    );
    await queryRunner.query(
      `CREATE INDEX "IDX_athlete_flags_symptom_report_id" ON "athlete_flags" ("symptom_report_id")`,
    );
  }

  public async down(queryRunner: QueryRunner): Promise<void> {
    // Reverse order of creation; dropping a table drops its own indexes and constraints.
    await queryRunner.query(`DROP TABLE "athlete_flags"`);
    await queryRunner.query(`DROP TABLE "symptom_reports"`);
    await queryRunner.query(`DROP TABLE "evening_logs"`);
    await queryRunner.query(`DROP TABLE "supplement_entries"`);
    await queryRunner.query(`DROP TABLE "meal_entries"`);
    await queryRunner.query(`DROP TABLE "fluid_entries"`);
    await queryRunner.query(`DROP TABLE "weigh_ins"`);
    await queryRunner.query(`DROP TABLE "foods"`);
  }
}
