import type { MigrationInterface, QueryRunner } from 'typeorm';

/** Two more account preferences: how the person writes numbers, and their default currency. */
export class UserNumberFormatCurrency1764738000000 implements MigrationInterface {
  name = 'UserNumberFormatCurrency1764738000000';

  async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(
      `ALTER TABLE "user" ADD COLUMN "number_format" varchar NOT NULL DEFAULT ('point-comma')`,
    );
    await queryRunner.query(
      `ALTER TABLE "user" ADD COLUMN "currency" varchar(3) NOT NULL DEFAULT ('EUR')`,
    );
  }

  async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`ALTER TABLE "user" DROP COLUMN "currency"`);
    await queryRunner.query(`ALTER TABLE "user" DROP COLUMN "number_format"`);
  }
}
