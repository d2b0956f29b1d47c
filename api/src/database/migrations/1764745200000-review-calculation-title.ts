import type { MigrationInterface, QueryRunner } from 'typeorm';

/**
 * The calculation's title at each review decision, so a later rename does not change what an
 * approval says was approved. Decisions made before this column take the title of today, the
 * best that is known of them.
 */
export class ReviewCalculationTitle1764745200000 implements MigrationInterface {
  name = 'ReviewCalculationTitle1764745200000';

  async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`ALTER TABLE "review" ADD COLUMN "calculation_title" varchar`);
    await queryRunner.query(`
      UPDATE "review" SET "calculation_title" = (
        SELECT "calculation"."title" FROM "calculation"
        JOIN "calculation_version" ON "calculation_version"."calculation_id" = "calculation"."id"
        WHERE "calculation_version"."id" = "review"."version_id"
      )
    `);
  }

  async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`ALTER TABLE "review" DROP COLUMN "calculation_title"`);
  }
}
