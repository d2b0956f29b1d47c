import type { MigrationInterface, QueryRunner } from 'typeorm';

/** Fill logs: real fills of a calculation version, their readings and the server's reduction. */
export class FillLogs1764723600000 implements MigrationInterface {
  name = 'FillLogs1764723600000';

  async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`
      CREATE TABLE "fill_log" (
        "id" varchar(36) PRIMARY KEY NOT NULL,
        "calculation_id" varchar(36) NOT NULL REFERENCES "calculation" ("id"),
        "version_number" integer NOT NULL,
        "created_by" varchar(36) NOT NULL REFERENCES "user" ("id"),
        "filled_at" varchar NOT NULL,
        "place" varchar NOT NULL DEFAULT (''),
        "envelope_label" varchar NOT NULL DEFAULT (''),
        "gas_source" varchar NOT NULL,
        "ambient" text NOT NULL,
        "readings" text NOT NULL,
        "note" varchar NOT NULL DEFAULT (''),
        "outputs" text NOT NULL,
        "steps" text NOT NULL,
        "warnings" text NOT NULL,
        "points" text NOT NULL,
        "engine_version" varchar NOT NULL,
        "created_at" datetime NOT NULL DEFAULT (datetime('now')),
        "updated_at" datetime NOT NULL DEFAULT (datetime('now')),
        FOREIGN KEY ("calculation_id", "version_number")
          REFERENCES "calculation_version" ("calculation_id", "number")
      )`);
    await queryRunner.query(
      `CREATE INDEX "idx_fill_log_calculation" ON "fill_log" ("calculation_id", "filled_at")`,
    );
  }

  async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`DROP TABLE "fill_log"`);
  }
}
