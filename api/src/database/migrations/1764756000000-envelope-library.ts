import type { MigrationInterface, QueryRunner } from 'typeorm';

/**
 * Starter envelopes: invented, generic examples so the library is not empty on a first start.
 * Their figures are placeholders to be replaced by the team's own (the notes say so); they come
 * from no maker's data sheet.
 */
export const STARTER_ENVELOPES = [
  {
    id: '6f1c2a7e-3b4d-4e5f-8a9b-0c1d2e3f4a51',
    name: 'Practice sphere 300 g',
    kind: 'extensible',
    massKg: 0.3,
    burstDiameterM: 4,
    ratedSuperpressurePa: null,
    film: 'natural latex',
  },
  {
    id: '6f1c2a7e-3b4d-4e5f-8a9b-0c1d2e3f4a52',
    name: 'Practice sphere 100 g',
    kind: 'extensible',
    massKg: 0.1,
    burstDiameterM: 2,
    ratedSuperpressurePa: null,
    film: 'natural latex',
  },
  {
    id: '6f1c2a7e-3b4d-4e5f-8a9b-0c1d2e3f4a53',
    name: 'Tethered film sphere 150 g',
    kind: 'fixed',
    massKg: 0.15,
    burstDiameterM: null,
    ratedSuperpressurePa: 1500,
    film: 'metallised film',
  },
] as const;

const EXAMPLE_NOTE =
  'Example values to show how the library works, not from any maker: weigh your own envelope and take its ratings from its data sheet before using it.';

/** The team's envelope library, with a few starter examples, and a fill log's link to it. */
export class EnvelopeLibrary1764756000000 implements MigrationInterface {
  name = 'EnvelopeLibrary1764756000000';

  async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`
      CREATE TABLE "envelope" (
        "id" varchar(36) PRIMARY KEY NOT NULL,
        "name" varchar NOT NULL,
        "kind" varchar NOT NULL CHECK ("kind" IN ('extensible', 'fixed')),
        "mass_kg" real NOT NULL,
        "burst_diameter_m" real,
        "rated_superpressure_pa" real,
        "drag_coefficient" real,
        "film" varchar NOT NULL DEFAULT (''),
        "notes" varchar NOT NULL DEFAULT (''),
        "version" integer NOT NULL DEFAULT (1),
        "created_by" varchar(36) REFERENCES "user" ("id"),
        "created_at" datetime NOT NULL DEFAULT (datetime('now')),
        "updated_at" datetime NOT NULL DEFAULT (datetime('now'))
      )`);
    for (const starter of STARTER_ENVELOPES) {
      await queryRunner.query(
        `INSERT INTO "envelope" ("id", "name", "kind", "mass_kg", "burst_diameter_m",
          "rated_superpressure_pa", "film", "notes") VALUES (?, ?, ?, ?, ?, ?, ?, ?)`,
        [
          starter.id,
          starter.name,
          starter.kind,
          starter.massKg,
          starter.burstDiameterM,
          starter.ratedSuperpressurePa,
          starter.film,
          EXAMPLE_NOTE,
        ],
      );
    }
    // Null: the log names no library envelope (every log written before the library).
    await queryRunner.query(
      `ALTER TABLE "fill_log" ADD COLUMN "envelope_id" varchar(36) REFERENCES "envelope" ("id")`,
    );
    await queryRunner.query(`CREATE INDEX "idx_fill_log_envelope" ON "fill_log" ("envelope_id")`);
  }

  async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`DROP INDEX "idx_fill_log_envelope"`);
    await queryRunner.query(`ALTER TABLE "fill_log" DROP COLUMN "envelope_id"`);
    await queryRunner.query(`DROP TABLE "envelope"`);
  }
}
