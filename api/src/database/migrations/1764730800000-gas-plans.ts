import type { MigrationInterface, QueryRunner } from 'typeorm';

/** Gas and cost plans for events and launch campaigns. */
export class GasPlans1764730800000 implements MigrationInterface {
  name = 'GasPlans1764730800000';

  async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`
      CREATE TABLE "gas_plan" (
        "id" varchar(36) PRIMARY KEY NOT NULL,
        "owner_id" varchar(36) NOT NULL REFERENCES "user" ("id"),
        "title" varchar NOT NULL,
        "event_date" varchar NOT NULL DEFAULT (''),
        "inputs" text NOT NULL,
        "result" text NOT NULL,
        "engine_version" varchar NOT NULL,
        "created_at" datetime NOT NULL DEFAULT (datetime('now')),
        "updated_at" datetime NOT NULL DEFAULT (datetime('now'))
      )`);
    await queryRunner.query(`CREATE INDEX "idx_gas_plan_owner" ON "gas_plan" ("owner_id")`);
  }

  async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`DROP TABLE "gas_plan"`);
  }
}
