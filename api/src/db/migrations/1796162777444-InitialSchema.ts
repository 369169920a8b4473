import type { MigrationInterface, QueryRunner } from 'typeorm';

/**
 * Teams, people and sign-in (users, sessions, reset tokens, invitations), athletes and their
 * shares, consents, and the mail outbox. Generated with `migration:generate`, then regrouped by
 * table with foreign keys inline. Ids use gen_random_uuid(), built into PostgreSQL 13+.
 */
export class InitialSchema1796162777444 implements MigrationInterface {
  name = 'InitialSchema1796162777444';

  public async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`
      CREATE TABLE "teams" (
        "id" uuid NOT NULL DEFAULT gen_random_uuid(),
        "created_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(),
        "updated_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(),
        "name" character varying(100) NOT NULL,
        "settings" jsonb NOT NULL DEFAULT '{}',
        CONSTRAINT "PK_teams" PRIMARY KEY ("id")
      )`);

    await queryRunner.query(`
      CREATE TABLE "users" (
        "id" uuid NOT NULL DEFAULT gen_random_uuid(),
        "created_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(),
        "updated_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(),
        "team_id" uuid NOT NULL,
        "email" character varying(254) NOT NULL,
        "name" character varying(100) NOT NULL,
        "role" character varying(16) NOT NULL,
        "password_hash" character varying(100) NOT NULL,
        "time_zone" character varying(64) NOT NULL DEFAULT 'UTC',
        "weight_unit" character varying(4) NOT NULL DEFAULT 'kg',
        "volume_unit" character varying(4) NOT NULL DEFAULT 'ml',
        "password_changed_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(),
        CONSTRAINT "PK_users" PRIMARY KEY ("id"),
        CONSTRAINT "FK_users_team_id" FOREIGN KEY ("team_id") REFERENCES "teams"("id") ON DELETE CASCADE,
        CONSTRAINT "CHK_users_role" CHECK ("role" IN ('owner', 'coach', 'assistant', 'athlete')),
        CONSTRAINT "CHK_users_weight_unit" CHECK ("weight_unit" IN ('kg', 'lb')),
        CONSTRAINT "CHK_users_volume_unit" CHECK ("volume_unit" IN ('ml', 'floz'))
      )`);
    await queryRunner.query(`CREATE INDEX "IDX_users_team_id" ON "users" ("team_id")`);
    await queryRunner.query(`CREATE UNIQUE INDEX "UQ_users_email" ON "users" ("email")`);

    await queryRunner.query(`
      CREATE TABLE "sessions" (
        "id" uuid NOT NULL DEFAULT gen_random_uuid(),
        "created_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(),
        "updated_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(),
        "user_id" uuid NOT NULL,
        "expires_at" TIMESTAMP WITH TIME ZONE NOT NULL,
        "revoked_at" TIMESTAMP WITH TIME ZONE,
        "last_seen_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(),
        "user_agent" character varying(500),
        "ip" character varying(64),
        CONSTRAINT "PK_sessions" PRIMARY KEY ("id"),
        CONSTRAINT "FK_sessions_user_id" FOREIGN KEY ("user_id") REFERENCES "users"("id") ON DELETE CASCADE
      )`);
    await queryRunner.query(`CREATE INDEX "IDX_sessions_user_id" ON "sessions" ("user_id")`);

    await queryRunner.query(`
      CREATE TABLE "password_reset_tokens" (
        "id" uuid NOT NULL DEFAULT gen_random_uuid(),
        "created_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(),
        "updated_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(),
        "user_id" uuid NOT NULL,
        "token_hash" character varying(64) NOT NULL,
        "expires_at" TIMESTAMP WITH TIME ZONE NOT NULL,
        "used_at" TIMESTAMP WITH TIME ZONE,
        CONSTRAINT "PK_password_reset_tokens" PRIMARY KEY ("id"),
        CONSTRAINT "FK_password_reset_tokens_user_id" FOREIGN KEY ("user_id") REFERENCES "users"("id") ON DELETE CASCADE
      )`);
    await queryRunner.query(
      `CREATE INDEX "IDX_password_reset_tokens_user_id" ON "password_reset_tokens" ("user_id")`,
    );
    await queryRunner.query(
      `CREATE UNIQUE INDEX "UQ_password_reset_tokens_token_hash" ON "password_reset_tokens" ("token_hash")`,
    );

    await queryRunner.query(`
      CREATE TABLE "invitations" (
        "id" uuid NOT NULL DEFAULT gen_random_uuid(),
        "created_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(),
        "updated_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(),
        "team_id" uuid NOT NULL,
        "email" character varying(254) NOT NULL,
        "name" character varying(100) NOT NULL,
        "role" character varying(16) NOT NULL,
        "invited_by_id" uuid NOT NULL,
        "coach_id" uuid,
        "token_hash" character varying(64) NOT NULL,
        "expires_at" TIMESTAMP WITH TIME ZONE NOT NULL,
        "accepted_at" TIMESTAMP WITH TIME ZONE,
        "revoked_at" TIMESTAMP WITH TIME ZONE,
        "accepted_user_id" uuid,
        CONSTRAINT "PK_invitations" PRIMARY KEY ("id"),
        CONSTRAINT "FK_invitations_team_id" FOREIGN KEY ("team_id") REFERENCES "teams"("id") ON DELETE CASCADE,
        CONSTRAINT "FK_invitations_invited_by_id" FOREIGN KEY ("invited_by_id") REFERENCES "users"("id") ON DELETE CASCADE,
        CONSTRAINT "FK_invitations_coach_id" FOREIGN KEY ("coach_id") REFERENCES "users"("id") ON DELETE SET NULL,
        CONSTRAINT "FK_invitations_accepted_user_id" FOREIGN KEY ("accepted_user_id") REFERENCES "users"("id") ON DELETE SET NULL,
        CONSTRAINT "CHK_invitations_role" CHECK ("role" IN ('athlete', 'coach', 'assistant'))
      )`);
    await queryRunner.query(`CREATE INDEX "IDX_invitations_team_id" ON "invitations" ("team_id")`);
    await queryRunner.query(`CREATE INDEX "IDX_invitations_email" ON "invitations" ("email")`);
    await queryRunner.query(
      `CREATE INDEX "IDX_invitations_invited_by_id" ON "invitations" ("invited_by_id")`,
    );
    await queryRunner.query(`CREATE INDEX "IDX_invitations_coach_id" ON "invitations" ("coach_id")`);
    await queryRunner.query(
      `CREATE INDEX "IDX_invitations_accepted_user_id" ON "invitations" ("accepted_user_id")`,
    );
    await queryRunner.query(
      `CREATE UNIQUE INDEX "UQ_invitations_token_hash" ON "invitations" ("token_hash")`,
    );

    await queryRunner.query(`
      CREATE TABLE "athletes" (
        "id" uuid NOT NULL DEFAULT gen_random_uuid(),
        "created_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(),
        "updated_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(),
        "user_id" uuid NOT NULL,
        "team_id" uuid NOT NULL,
        "coach_id" uuid NOT NULL,
        "status" character varying(16) NOT NULL DEFAULT 'intake_pending',
        "sex" character varying(8),
        "birth_date" date,
        "height_cm" double precision,
        "usual_water_ml" double precision,
        "usual_energy_kcal" double precision,
        "goal" character varying(16),
        "event_type" character varying(16),
        "event_name" character varying(100),
        "event_date" date,
        "event_time" character varying(5),
        "event_time_zone" character varying(64),
        "division" character varying(100),
        "weigh_in_limit_kg" double precision,
        "photo_consent" boolean NOT NULL DEFAULT false,
        "intake_completed_at" TIMESTAMP WITH TIME ZONE,
        CONSTRAINT "PK_athletes" PRIMARY KEY ("id"),
        CONSTRAINT "FK_athletes_user_id" FOREIGN KEY ("user_id") REFERENCES "users"("id") ON DELETE CASCADE,
        CONSTRAINT "FK_athletes_team_id" FOREIGN KEY ("team_id") REFERENCES "teams"("id") ON DELETE CASCADE,
        CONSTRAINT "FK_athletes_coach_id" FOREIGN KEY ("coach_id") REFERENCES "users"("id") ON DELETE RESTRICT,
        CONSTRAINT "CHK_athletes_status" CHECK ("status" IN ('intake_pending', 'active', 'ended')),
        CONSTRAINT "CHK_athletes_sex" CHECK ("sex" IS NULL OR "sex" IN ('female', 'male')),
        CONSTRAINT "CHK_athletes_goal" CHECK ("goal" IS NULL OR "goal" IN ('lose', 'maintain', 'gain')),
        CONSTRAINT "CHK_athletes_event_type" CHECK ("event_type" IS NULL OR "event_type" IN ('show', 'shoot', 'weigh_in', 'none'))
      )`);
    await queryRunner.query(`CREATE UNIQUE INDEX "UQ_athletes_user_id" ON "athletes" ("user_id")`);
    await queryRunner.query(`CREATE INDEX "IDX_athletes_team_id" ON "athletes" ("team_id")`);
    await queryRunner.query(`CREATE INDEX "IDX_athletes_coach_id" ON "athletes" ("coach_id")`);
    await queryRunner.query(`CREATE INDEX "IDX_athletes_event_date" ON "athletes" ("event_date")`);

    await queryRunner.query(`
      CREATE TABLE "athlete_shares" (
        "id" uuid NOT NULL DEFAULT gen_random_uuid(),
        "created_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(),
        "updated_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(),
        "athlete_id" uuid NOT NULL,
        "user_id" uuid NOT NULL,
        "shared_by_id" uuid,
        CONSTRAINT "PK_athlete_shares" PRIMARY KEY ("id"),
        CONSTRAINT "FK_athlete_shares_athlete_id" FOREIGN KEY ("athlete_id") REFERENCES "athletes"("id") ON DELETE CASCADE,
        CONSTRAINT "FK_athlete_shares_user_id" FOREIGN KEY ("user_id") REFERENCES "users"("id") ON DELETE CASCADE,
        CONSTRAINT "FK_athlete_shares_shared_by_id" FOREIGN KEY ("shared_by_id") REFERENCES "users"("id") ON DELETE SET NULL
      )`);
    // The unique pair also serves lookups by athlete_id (its leading column).
    await queryRunner.query(
      `CREATE UNIQUE INDEX "UQ_athlete_shares_athlete_id_user_id" ON "athlete_shares" ("athlete_id", "user_id")`,
    );
    await queryRunner.query(`CREATE INDEX "IDX_athlete_shares_user_id" ON "athlete_shares" ("user_id")`);
    await queryRunner.query(
      `CREATE INDEX "IDX_athlete_shares_shared_by_id" ON "athlete_shares" ("shared_by_id")`,
    );

    await queryRunner.query(`
      CREATE TABLE "consents" (
        "id" uuid NOT NULL DEFAULT gen_random_uuid(),
        "created_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(),
        "updated_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(),
        "user_id" uuid NOT NULL,
        "kind" character varying(40) NOT NULL,
        "version" character varying(20) NOT NULL,
        "granted" boolean NOT NULL,
        "accepted_at" TIMESTAMP WITH TIME ZONE NOT NULL,
        CONSTRAINT "PK_consents" PRIMARY KEY ("id"),
        CONSTRAINT "FK_consents_user_id" FOREIGN KEY ("user_id") REFERENCES "users"("id") ON DELETE CASCADE,
        CONSTRAINT "CHK_consents_kind" CHECK ("kind" IN ('safety_acknowledgement', 'photo_consent'))
      )`);
    await queryRunner.query(`CREATE INDEX "IDX_consents_user_id" ON "consents" ("user_id")`);

    await queryRunner.query(`
      CREATE TABLE "outbox_messages" (
        "id" uuid NOT NULL DEFAULT gen_random_uuid(),
        "created_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(),
        "updated_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(),
        "kind" character varying(40) NOT NULL,
        "to_address" character varying(254) NOT NULL,
        "subject" character varying(300) NOT NULL,
        "text_body" text NOT NULL,
        "html_body" text,
        "status" character varying(10) NOT NULL DEFAULT 'pending',
        "attempts" integer NOT NULL DEFAULT 0,
        "last_error" text,
        "sent_at" TIMESTAMP WITH TIME ZONE,
        "message_id" character varying(255),
        CONSTRAINT "PK_outbox_messages" PRIMARY KEY ("id"),
        CONSTRAINT "CHK_outbox_messages_status" CHECK ("status" IN ('pending', 'sent', 'failed'))
      )`);
    await queryRunner.query(
      `CREATE INDEX "IDX_outbox_messages_status_created_at" ON "outbox_messages" ("status", "created_at")`,
    );
    await queryRunner.query(
      `CREATE UNIQUE INDEX "UQ_outbox_messages_message_id" ON "outbox_messages" ("message_id")`,
    );
  }

  public async down(queryRunner: QueryRunner): Promise<void> {
    // Reverse order of creation; dropping a table drops its own indexes and constraints.
    await queryRunner.query(`DROP TABLE "outbox_messages"`);
    await queryRunner.query(`DROP TABLE "consents"`);
    await queryRunner.query(`DROP TABLE "athlete_shares"`);
    await queryRunner.query(`DROP TABLE "athletes"`);
    await queryRunner.query(`DROP TABLE "invitations"`);
    await queryRunner.query(`DROP TABLE "password_reset_tokens"`);
    await queryRunner.query(`DROP TABLE "sessions"`);
    await queryRunner.query(`DROP TABLE "users"`);
    await queryRunner.query(`DROP TABLE "teams"`);
  }
}
