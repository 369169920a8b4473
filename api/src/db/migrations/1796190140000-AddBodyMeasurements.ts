import type { MigrationInterface, QueryRunner } from 'typeorm';

/**
 * Body composition: measurement sessions (skinfolds or circumferences, as taken, with who measured
 * and who entered them), and the body weight the intake asks for, which the plan's baseline uses
 * until the athlete has weigh-ins.
 */
export class AddBodyMeasurements1796190140000 implements MigrationInterface {
  name = 'AddBodyMeasurements1796190140000';

  public async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(
      `CREATE TABLE "body_measurements" ("id" uuid NOT NULL DEFAULT gen_random_uuid(), "created_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), "updated_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), "athlete_id" uuid NOT NULL, "local_date" date NOT NULL, "method" character varying(16) NOT NULL, "density_equation" character varying(8) NOT NULL, "skinfolds_mm" jsonb NOT NULL DEFAULT '{}', "neck_cm" double precision, "waist_cm" double precision, "hip_cm" double precision, "height_cm" double precision, "measured_by" character varying(80) NOT NULL, "entered_by_id" uuid NOT NULL, CONSTRAINT "CHK_body_measurements_density_equation" CHECK ("density_equation" IN ('siri', 'brozek')), CONSTRAINT "CHK_body_measurements_method" CHECK ("method" IN ('skinfold_3', 'skinfold_7', 'circumference')), CONSTRAINT "PK_body_measurements" PRIMARY KEY ("id"))`,
    );
    await queryRunner.query(
      `CREATE INDEX "IDX_body_measurements_entered_by_id" ON "body_measurements" ("entered_by_id")`,
    );
    await queryRunner.query(
      `CREATE INDEX "IDX_body_measurements_athlete_id_local_date" ON "body_measurements" ("athlete_id", "local_date")`,
    );
    await queryRunner.query(
      `ALTER TABLE "body_measurements" ADD CONSTRAINT "FK_body_measurements_athlete_id" FOREIGN KEY ("athlete_id") REFERENCES "athletes"("id") ON DELETE CASCADE ON UPDATE NO ACTION`,
    );
    await queryRunner.query(
      `ALTER TABLE "body_measurements" ADD CONSTRAINT "FK_body_measurements_entered_by_id" FOREIGN KEY ("entered_by_id") REFERENCES "users"("id") ON DELETE RESTRICT ON UPDATE NO ACTION`,
    );
    await queryRunner.query(`ALTER TABLE "athletes" ADD "intake_weight_kg" double precision`);
  }

  public async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`ALTER TABLE "athletes" DROP COLUMN "intake_weight_kg"`);
    await queryRunner.query(`DROP TABLE "body_measurements"`);
  }
}
