import type { MigrationInterface, QueryRunner } from 'typeorm';

/**
 * The design chain: a calculation continued from another (sizing → flight → rules check) records
 * its source and the source version its inputs were taken from, and the input paths it still
 * needs filled. No foreign key: calculations are archived, never deleted, and SQLite cannot drop
 * a column a foreign key uses, which `down` needs.
 */
export class CalculationLinks1764759600000 implements MigrationInterface {
  name = 'CalculationLinks1764759600000';

  async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(
      `ALTER TABLE "calculation" ADD COLUMN "source_calculation_id" varchar(36)`,
    );
    await queryRunner.query(`ALTER TABLE "calculation" ADD COLUMN "source_version_number" integer`);
    await queryRunner.query(`ALTER TABLE "calculation" ADD COLUMN "source_needs" text`);
    await queryRunner.query(
      `CREATE INDEX "IDX_calculation_source" ON "calculation" ("source_calculation_id")`,
    );
  }

  async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`DROP INDEX "IDX_calculation_source"`);
    await queryRunner.query(`ALTER TABLE "calculation" DROP COLUMN "source_needs"`);
    await queryRunner.query(`ALTER TABLE "calculation" DROP COLUMN "source_version_number"`);
    await queryRunner.query(`ALTER TABLE "calculation" DROP COLUMN "source_calculation_id"`);
  }
}
