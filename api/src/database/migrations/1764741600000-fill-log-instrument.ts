import type { MigrationInterface, QueryRunner } from 'typeorm';

/** A fill log's instruments (scale resolution, ballast tolerance); null keeps the defaults. */
export class FillLogInstrument1764741600000 implements MigrationInterface {
  name = 'FillLogInstrument1764741600000';

  async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`ALTER TABLE "fill_log" ADD COLUMN "instrument" text`);
  }

  async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`ALTER TABLE "fill_log" DROP COLUMN "instrument"`);
  }
}
