import type { MigrationInterface, QueryRunner } from 'typeorm';

/** Accounts, calculations with their versions, reviews, the audit trail and the mail outbox. */
export class AccountsCalculationsReviews1764640800000 implements MigrationInterface {
  name = 'AccountsCalculationsReviews1764640800000';

  async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`
      CREATE TABLE "user" (
        "id" varchar(36) PRIMARY KEY NOT NULL,
        "email" varchar NOT NULL UNIQUE,
        "display_name" varchar NOT NULL,
        "password_hash" varchar NOT NULL,
        "roles" text NOT NULL,
        "unit_system" varchar NOT NULL DEFAULT ('si'),
        "token_version" integer NOT NULL DEFAULT (0),
        "created_at" datetime NOT NULL DEFAULT (datetime('now')),
        "updated_at" datetime NOT NULL DEFAULT (datetime('now'))
      )`);
    await queryRunner.query(`
      CREATE TABLE "password_reset_token" (
        "id" varchar(36) PRIMARY KEY NOT NULL,
        "user_id" varchar(36) NOT NULL REFERENCES "user" ("id") ON DELETE CASCADE,
        "token_hash" varchar NOT NULL UNIQUE,
        "expires_at" datetime NOT NULL,
        "used_at" datetime,
        "created_at" datetime NOT NULL DEFAULT (datetime('now'))
      )`);
    await queryRunner.query(`
      CREATE TABLE "calculation" (
        "id" varchar(36) PRIMARY KEY NOT NULL,
        "title" varchar NOT NULL,
        "kind" varchar NOT NULL,
        "owner_id" varchar(36) NOT NULL REFERENCES "user" ("id"),
        "visibility" varchar NOT NULL DEFAULT ('private'),
        "tags" text NOT NULL,
        "latest_version" integer NOT NULL,
        "latest_status" varchar NOT NULL,
        "ever_submitted" boolean NOT NULL DEFAULT (0),
        "archived_at" datetime,
        "created_at" datetime NOT NULL DEFAULT (datetime('now')),
        "updated_at" datetime NOT NULL DEFAULT (datetime('now'))
      )`);
    await queryRunner.query(`CREATE INDEX "idx_calculation_owner" ON "calculation" ("owner_id")`);
    await queryRunner.query(
      `CREATE INDEX "idx_calculation_updated" ON "calculation" ("updated_at")`,
    );
    await queryRunner.query(`
      CREATE TABLE "calculation_version" (
        "id" varchar(36) PRIMARY KEY NOT NULL,
        "calculation_id" varchar(36) NOT NULL REFERENCES "calculation" ("id"),
        "number" integer NOT NULL,
        "inputs" text NOT NULL,
        "outputs" text NOT NULL,
        "steps" text NOT NULL,
        "warnings" text NOT NULL,
        "series" text,
        "engine_version" varchar NOT NULL,
        "author_id" varchar(36) NOT NULL REFERENCES "user" ("id"),
        "note" varchar NOT NULL DEFAULT (''),
        "fingerprint" varchar(64) NOT NULL,
        "status" varchar NOT NULL DEFAULT ('draft'),
        "reviewer_id" varchar(36) REFERENCES "user" ("id"),
        "submitted_at" datetime,
        "created_at" datetime NOT NULL DEFAULT (datetime('now'))
      )`);
    await queryRunner.query(
      `CREATE UNIQUE INDEX "idx_version_number" ON "calculation_version" ("calculation_id", "number")`,
    );
    await queryRunner.query(
      `CREATE INDEX "idx_version_fingerprint" ON "calculation_version" ("fingerprint")`,
    );
    await queryRunner.query(
      `CREATE INDEX "idx_version_status" ON "calculation_version" ("status")`,
    );
    // Stored content is immutable: the database itself refuses to change it.
    await queryRunner.query(`
      CREATE TRIGGER "trg_version_content_immutable"
      BEFORE UPDATE OF "calculation_id", "number", "inputs", "outputs", "steps", "warnings", "series",
        "engine_version", "author_id", "note", "fingerprint", "created_at" ON "calculation_version"
      BEGIN
        SELECT RAISE(ABORT, 'calculation versions are immutable');
      END`);
    await queryRunner.query(`
      CREATE TRIGGER "trg_version_no_delete" BEFORE DELETE ON "calculation_version"
      BEGIN
        SELECT RAISE(ABORT, 'calculation versions are never deleted');
      END`);
    await queryRunner.query(`
      CREATE TABLE "review" (
        "id" varchar(36) PRIMARY KEY NOT NULL,
        "version_id" varchar(36) NOT NULL REFERENCES "calculation_version" ("id"),
        "reviewer_id" varchar(36) NOT NULL REFERENCES "user" ("id"),
        "decision" varchar NOT NULL,
        "comment" varchar NOT NULL,
        "fingerprint" varchar(64) NOT NULL,
        "created_at" datetime NOT NULL DEFAULT (datetime('now'))
      )`);
    await queryRunner.query(`CREATE INDEX "idx_review_version" ON "review" ("version_id")`);
    await queryRunner.query(`
      CREATE TABLE "audit_entry" (
        "id" integer PRIMARY KEY AUTOINCREMENT NOT NULL,
        "actor_id" varchar(36),
        "action" varchar NOT NULL,
        "target_type" varchar NOT NULL,
        "target_id" varchar,
        "detail" text,
        "created_at" datetime NOT NULL DEFAULT (datetime('now'))
      )`);
    await queryRunner.query(`CREATE INDEX "idx_audit_action" ON "audit_entry" ("action")`);
    await queryRunner.query(`CREATE INDEX "idx_audit_created" ON "audit_entry" ("created_at")`);
    await queryRunner.query(`
      CREATE TABLE "outbox_message" (
        "id" integer PRIMARY KEY AUTOINCREMENT NOT NULL,
        "from" varchar NOT NULL,
        "to" text NOT NULL,
        "subject" varchar NOT NULL,
        "text" text NOT NULL,
        "message_id" varchar,
        "received_at" datetime NOT NULL DEFAULT (datetime('now'))
      )`);
  }

  async down(queryRunner: QueryRunner): Promise<void> {
    for (const table of [
      'outbox_message',
      'audit_entry',
      'review',
      'calculation_version',
      'calculation',
      'password_reset_token',
      'user',
    ]) {
      await queryRunner.query(`DROP TABLE "${table}"`);
    }
  }
}
