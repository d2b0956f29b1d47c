import type { MigrationInterface, QueryRunner } from 'typeorm';

/** First schema: one row describing this database, written when it is created. */
export class InitSchema1764633600000 implements MigrationInterface {
  name = 'InitSchema1764633600000';

  async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`
      CREATE TABLE "installation" (
        "id" integer PRIMARY KEY NOT NULL CHECK ("id" = 1),
        "created_at" datetime NOT NULL DEFAULT (strftime('%Y-%m-%dT%H:%M:%fZ', 'now'))
      )`);
    await queryRunner.query(`INSERT INTO "installation" ("id") VALUES (1)`);
  }

  async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`DROP TABLE "installation"`);
  }
}
