import type { MigrationInterface, QueryRunner } from 'typeorm';

/**
 * The outbox records each attempt before it is made: a row is claimed as `sending` (attempts + 1,
 * a lease until `sending_until`) in its own commit, sent over SMTP, then marked `sent` with the
 * server's answer in `smtp_response`. A row still `sending` after its lease was cut off mid-send.
 */
export class OutboxSendingLease1796190000001 implements MigrationInterface {
  name = 'OutboxSendingLease1796190000001';

  public async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`ALTER TABLE "outbox_messages" DROP CONSTRAINT "CHK_outbox_messages_status"`);
    await queryRunner.query(
      `ALTER TABLE "outbox_messages" ADD CONSTRAINT "CHK_outbox_messages_status" CHECK ("status" IN ('pending', 'sending', 'sent', 'failed'))`,
    );
    await queryRunner.query(`ALTER TABLE "outbox_messages" ADD "sending_until" TIMESTAMP WITH TIME ZONE`);
    await queryRunner.query(`ALTER TABLE "outbox_messages" ADD "smtp_response" character varying(500)`);
  }

  public async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`UPDATE "outbox_messages" SET "status" = 'pending' WHERE "status" = 'sending'`);
    await queryRunner.query(`ALTER TABLE "outbox_messages" DROP COLUMN "smtp_response"`);
    await queryRunner.query(`ALTER TABLE "outbox_messages" DROP COLUMN "sending_until"`);
    await queryRunner.query(`ALTER TABLE "outbox_messages" DROP CONSTRAINT "CHK_outbox_messages_status"`);
    await queryRunner.query(
      `ALTER TABLE "outbox_messages" ADD CONSTRAINT "CHK_outbox_messages_status" CHECK ("status" IN ('pending', 'sent', 'failed'))`,
    );
  }
}
