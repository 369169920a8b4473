import type { MigrationInterface, QueryRunner } from 'typeorm';

/** Making weight: the weigh-in's record on the athlete, cut plans and their acknowledgements. */
export class AddWeightCuts1796200000000 implements MigrationInterface {
  name = 'AddWeightCuts1796200000000';

  public async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`ALTER TABLE "athletes" ADD "weigh_in_timing" character varying(16)`);
    await queryRunner.query(`ALTER TABLE "athletes" ADD "competition_time" character varying(5)`);
    await queryRunner.query(`ALTER TABLE "athletes" ADD "usual_weight_kg" double precision`);
    await queryRunner.query(`ALTER TABLE "athletes" ADD "class_below_kg" double precision`);
    await queryRunner.query(`ALTER TABLE "athletes" ADD "class_above_kg" double precision`);
    await queryRunner.query(
      `ALTER TABLE "athletes" ADD CONSTRAINT "CHK_athletes_weigh_in_timing" CHECK ("weigh_in_timing" IS NULL OR "weigh_in_timing" IN ('day_before', 'same_day'))`,
    );
    await queryRunner.query(`
      CREATE TABLE "cut_plans" (
        "id" uuid NOT NULL DEFAULT gen_random_uuid(),
        "created_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(),
        "updated_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(),
        "athlete_id" uuid NOT NULL,
        "weigh_in_date" date NOT NULL,
        "limit_kg" double precision NOT NULL,
        "start_date" date NOT NULL,
        "start_kg" double precision NOT NULL,
        "pre_acute_kg" double precision NOT NULL,
        "acute_days" integer NOT NULL,
        "path" character varying(8) NOT NULL,
        "threshold_pct" double precision NOT NULL,
        "notes" text,
        "created_by_id" uuid NOT NULL,
        CONSTRAINT "CHK_cut_plans_acute_days" CHECK ("acute_days" >= 0),
        CONSTRAINT "CHK_cut_plans_path" CHECK ("path" IN ('linear', 'rate')),
        CONSTRAINT "PK_cut_plans" PRIMARY KEY ("id")
      )`);
    await queryRunner.query(`CREATE INDEX "IDX_cut_plans_athlete_id" ON "cut_plans" ("athlete_id")`);
    await queryRunner.query(`CREATE INDEX "IDX_cut_plans_created_by_id" ON "cut_plans" ("created_by_id")`);
    await queryRunner.query(`
      CREATE TABLE "cut_plan_acknowledgements" (
        "id" uuid NOT NULL DEFAULT gen_random_uuid(),
        "created_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(),
        "updated_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(),
        "cut_plan_id" uuid NOT NULL,
        "key" character varying(120) NOT NULL,
        "severity" character varying(8) NOT NULL,
        "message" text NOT NULL,
        "source" text NOT NULL,
        "acknowledged_by_id" uuid NOT NULL,
        "acknowledged_at" TIMESTAMP WITH TIME ZONE NOT NULL,
        CONSTRAINT "CHK_cut_plan_acknowledgements_severity" CHECK ("severity" IN ('warning', 'strong')),
        CONSTRAINT "PK_cut_plan_acknowledgements" PRIMARY KEY ("id")
      )`);
    await queryRunner.query(
      `CREATE INDEX "IDX_cut_plan_acknowledgements_acknowledged_by_id" ON "cut_plan_acknowledgements" ("acknowledged_by_id")`,
    );
    await queryRunner.query(
      `CREATE UNIQUE INDEX "UQ_cut_plan_acknowledgements_cut_plan_id_key" ON "cut_plan_acknowledgements" ("cut_plan_id", "key")`,
    );
    await queryRunner.query(
      `ALTER TABLE "cut_plans" ADD CONSTRAINT "FK_cut_plans_athlete_id" FOREIGN KEY ("athlete_id") REFERENCES "athletes"("id") ON DELETE CASCADE ON UPDATE NO ACTION`,
    );
    await queryRunner.query(
      `ALTER TABLE "cut_plans" ADD CONSTRAINT "FK_cut_plans_created_by_id" FOREIGN KEY ("created_by_id") REFERENCES "users"("id") ON DELETE RESTRICT ON UPDATE NO ACTION`,
    );
    await queryRunner.query(
      `ALTER TABLE "cut_plan_acknowledgements" ADD CONSTRAINT "FK_cut_plan_acknowledgements_cut_plan_id" FOREIGN KEY ("cut_plan_id") REFERENCES "cut_plans"("id") ON DELETE CASCADE ON UPDATE NO ACTION`,
    );
    await queryRunner.query(
      `ALTER TABLE "cut_plan_acknowledgements" ADD CONSTRAINT "FK_cut_plan_acknowledgements_acknowledged_by_id" FOREIGN KEY ("acknowledged_by_id") REFERENCES "users"("id") ON DELETE RESTRICT ON UPDATE NO ACTION`,
    );
  }

  public async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`DROP TABLE "cut_plan_acknowledgements"`);
    await queryRunner.query(`DROP TABLE "cut_plans"`);
    await queryRunner.query(`ALTER TABLE "athletes" DROP CONSTRAINT "CHK_athletes_weigh_in_timing"`);
    await queryRunner.query(`ALTER TABLE "athletes" DROP COLUMN "class_above_kg"`);
    await queryRunner.query(`ALTER TABLE "athletes" DROP COLUMN "class_below_kg"`);
    await queryRunner.query(`ALTER TABLE "athletes" DROP COLUMN "usual_weight_kg"`);
    await queryRunner.query(`ALTER TABLE "athletes" DROP COLUMN "competition_time"`);
    await queryRunner.query(`ALTER TABLE "athletes" DROP COLUMN "weigh_in_timing"`);
  }
}
