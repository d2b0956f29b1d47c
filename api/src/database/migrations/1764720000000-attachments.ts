import type { MigrationInterface, QueryRunner } from 'typeorm';

/** Uploaded files' records (the bytes are stored under DATA_DIR/uploads by content hash). */
export class Attachments1764720000000 implements MigrationInterface {
  name = 'Attachments1764720000000';

  async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`
      CREATE TABLE "attachment" (
        "id" varchar(36) PRIMARY KEY NOT NULL,
        "calculation_id" varchar(36) NOT NULL REFERENCES "calculation" ("id"),
        "fill_log_id" varchar(36),
        "version_number" integer,
        "sha256" varchar(64) NOT NULL,
        "size_bytes" integer NOT NULL,
        "media_type" varchar NOT NULL,
        "file_name" varchar NOT NULL,
        "uploaded_by" varchar(36) REFERENCES "user" ("id"),
        "created_at" datetime NOT NULL DEFAULT (datetime('now'))
      )`);
    await queryRunner.query(
      `CREATE INDEX "idx_attachment_calculation" ON "attachment" ("calculation_id")`,
    );
    await queryRunner.query(`CREATE INDEX "idx_attachment_sha256" ON "attachment" ("sha256")`);
  }

  async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`DROP TABLE "attachment"`);
  }
}
