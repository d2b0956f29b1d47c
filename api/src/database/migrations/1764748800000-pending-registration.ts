import type { MigrationInterface, QueryRunner } from 'typeorm';

/** Registrations waiting for the mailed link; the account is created when it is opened. */
export class PendingRegistration1764748800000 implements MigrationInterface {
  name = 'PendingRegistration1764748800000';

  async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`
      CREATE TABLE "pending_registration" (
        "id" varchar(36) PRIMARY KEY NOT NULL,
        "email" varchar NOT NULL,
        "display_name" varchar NOT NULL,
        "password_hash" varchar NOT NULL,
        "number_format" varchar,
        "join_code" varchar,
        "token_hash" varchar NOT NULL UNIQUE,
        "expires_at" datetime NOT NULL,
        "created_at" datetime NOT NULL DEFAULT (datetime('now'))
      )`);
    await queryRunner.query(
      `CREATE INDEX "pending_registration_email" ON "pending_registration" ("email")`,
    );
  }

  async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`DROP TABLE "pending_registration"`);
  }
}
