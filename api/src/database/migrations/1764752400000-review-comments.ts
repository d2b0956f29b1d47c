import type { MigrationInterface, QueryRunner } from 'typeorm';

/** Reviewers' comments on versions, anchored to an input or a result, marked addressed later. */
export class ReviewComments1764752400000 implements MigrationInterface {
  name = 'ReviewComments1764752400000';

  async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`
      CREATE TABLE "review_comment" (
        "id" varchar(36) PRIMARY KEY NOT NULL,
        "calculation_id" varchar(36) NOT NULL REFERENCES "calculation" ("id") ON DELETE CASCADE,
        "version_number" integer NOT NULL,
        "author_id" varchar(36) NOT NULL REFERENCES "user" ("id"),
        "anchor_kind" varchar,
        "anchor_path" varchar,
        "body" text NOT NULL,
        "addressed_in_version" integer,
        "addressed_by" varchar(36) REFERENCES "user" ("id"),
        "addressed_at" datetime,
        "created_at" datetime NOT NULL DEFAULT (datetime('now'))
      )`);
    await queryRunner.query(
      `CREATE INDEX "IDX_review_comment_calculation" ON "review_comment" ("calculation_id")`,
    );
  }

  async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`DROP TABLE "review_comment"`);
  }
}
