import type { MigrationInterface, QueryRunner } from 'typeorm';

/** The local mail server keeps what each message had attached (the approval's sign-off PDF). */
export class OutboxAttachments1764727200000 implements MigrationInterface {
  name = 'OutboxAttachments1764727200000';

  async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(
      `ALTER TABLE "outbox_message" ADD COLUMN "attachments" text NOT NULL DEFAULT ('[]')`,
    );
  }

  async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`ALTER TABLE "outbox_message" DROP COLUMN "attachments"`);
  }
}
