import type { MigrationInterface, QueryRunner } from 'typeorm';
import { STARTER_ENVELOPES } from '../migrations/1764756000000-envelope-library';
import { POSTGRES_IMMUTABILITY_SQL } from './postgres-immutability';

const EXAMPLE_NOTE =
  'Example values to show how the library works, not from any maker: weigh your own envelope and take its ratings from its data sheet before using it.';

/**
 * The whole schema of the SQLite migrations up to 1764759600000 (calculation links), in one
 * step for PostgreSQL. Later migrations are written with TypeORM's portable Table API and run on
 * both databases (see migration-sets.ts). schema-parity.e2e-spec.ts builds both databases from
 * their migrations and compares them, so the two sets cannot drift apart unnoticed.
 */
export class PostgresSchema1764759600000 implements MigrationInterface {
  name = 'PostgresSchema1764759600000';

  async up(queryRunner: QueryRunner): Promise<void> {
    for (const statement of [...ACCOUNT_TABLES, ...CALCULATION_TABLES, ...CLASSROOM_TABLES]) {
      await queryRunner.query(statement);
    }
    for (const statement of POSTGRES_IMMUTABILITY_SQL) await queryRunner.query(statement);
    await queryRunner.query(`INSERT INTO "installation" ("id") VALUES (1)`);
    for (const starter of STARTER_ENVELOPES) {
      await queryRunner.query(
        `INSERT INTO "envelope" ("id", "name", "kind", "mass_kg", "burst_diameter_m",
          "rated_superpressure_pa", "film", "notes") VALUES ($1, $2, $3, $4, $5, $6, $7, $8)`,
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
  }

  async down(queryRunner: QueryRunner): Promise<void> {
    for (const table of [
      'exercise_submission',
      'worked_example',
      'classroom_member',
      'classroom',
      'gas_plan',
      'fill_log',
      'envelope',
      'attachment',
      'review_comment',
      'review',
      'calculation_version',
      'calculation',
      'outbox_message',
      'audit_entry',
      'pending_registration',
      'password_reset_token',
      'user',
      'installation',
    ]) {
      await queryRunner.query(`DROP TABLE "${table}"`);
    }
    await queryRunner.query(`DROP FUNCTION "loftwright_refuse_change"()`);
  }
}

/** The installation row, accounts, the audit trail and the mail outbox. */
const ACCOUNT_TABLES = [
  `CREATE TABLE "installation" (
    "id" integer PRIMARY KEY NOT NULL CHECK ("id" = 1),
    "created_at" timestamptz NOT NULL DEFAULT now()
  )`,
  `CREATE TABLE "user" (
    "id" varchar(36) PRIMARY KEY NOT NULL,
    "email" varchar NOT NULL UNIQUE,
    "display_name" varchar NOT NULL,
    "password_hash" varchar NOT NULL,
    "roles" text NOT NULL,
    "unit_system" varchar NOT NULL DEFAULT 'si',
    "token_version" integer NOT NULL DEFAULT 0,
    "created_at" timestamptz NOT NULL DEFAULT now(),
    "updated_at" timestamptz NOT NULL DEFAULT now(),
    "number_format" varchar NOT NULL DEFAULT 'point-comma',
    "currency" varchar(3) NOT NULL DEFAULT 'EUR'
  )`,
  `CREATE TABLE "password_reset_token" (
    "id" varchar(36) PRIMARY KEY NOT NULL,
    "user_id" varchar(36) NOT NULL REFERENCES "user" ("id") ON DELETE CASCADE,
    "token_hash" varchar NOT NULL UNIQUE,
    "expires_at" timestamptz NOT NULL,
    "used_at" timestamptz,
    "created_at" timestamptz NOT NULL DEFAULT now()
  )`,
  `CREATE TABLE "pending_registration" (
    "id" varchar(36) PRIMARY KEY NOT NULL,
    "email" varchar NOT NULL,
    "display_name" varchar NOT NULL,
    "password_hash" varchar NOT NULL,
    "number_format" varchar,
    "join_code" varchar,
    "token_hash" varchar NOT NULL UNIQUE,
    "expires_at" timestamptz NOT NULL,
    "created_at" timestamptz NOT NULL DEFAULT now()
  )`,
  `CREATE INDEX "pending_registration_email" ON "pending_registration" ("email")`,
  `CREATE TABLE "audit_entry" (
    "id" SERIAL PRIMARY KEY NOT NULL,
    "actor_id" varchar(36),
    "action" varchar NOT NULL,
    "target_type" varchar NOT NULL,
    "target_id" varchar,
    "detail" text,
    "created_at" timestamptz NOT NULL DEFAULT now()
  )`,
  `CREATE INDEX "idx_audit_action" ON "audit_entry" ("action")`,
  `CREATE INDEX "idx_audit_created" ON "audit_entry" ("created_at")`,
  `CREATE TABLE "outbox_message" (
    "id" SERIAL PRIMARY KEY NOT NULL,
    "from" varchar NOT NULL,
    "to" text NOT NULL,
    "subject" varchar NOT NULL,
    "text" text NOT NULL,
    "message_id" varchar,
    "received_at" timestamptz NOT NULL DEFAULT now(),
    "attachments" text NOT NULL DEFAULT '[]'
  )`,
];

/** Calculations, their versions, reviews, attachments, fill logs, envelopes and gas plans. */
const CALCULATION_TABLES = [
  `CREATE TABLE "calculation" (
    "id" varchar(36) PRIMARY KEY NOT NULL,
    "title" varchar NOT NULL,
    "kind" varchar NOT NULL,
    "owner_id" varchar(36) NOT NULL REFERENCES "user" ("id"),
    "visibility" varchar NOT NULL DEFAULT 'private',
    "tags" text NOT NULL,
    "latest_version" integer NOT NULL,
    "latest_status" varchar NOT NULL,
    "ever_submitted" boolean NOT NULL DEFAULT false,
    "archived_at" timestamptz,
    "created_at" timestamptz NOT NULL DEFAULT now(),
    "updated_at" timestamptz NOT NULL DEFAULT now(),
    "source_calculation_id" varchar(36),
    "source_version_number" integer,
    "source_needs" text
  )`,
  `CREATE INDEX "idx_calculation_owner" ON "calculation" ("owner_id")`,
  `CREATE INDEX "idx_calculation_updated" ON "calculation" ("updated_at")`,
  `CREATE INDEX "IDX_calculation_source" ON "calculation" ("source_calculation_id")`,
  `CREATE TABLE "calculation_version" (
    "id" varchar(36) PRIMARY KEY NOT NULL,
    "calculation_id" varchar(36) NOT NULL REFERENCES "calculation" ("id"),
    "number" integer NOT NULL,
    "inputs" text NOT NULL,
    "outputs" text NOT NULL,
    "steps" text NOT NULL,
    "warnings" text NOT NULL,
    "series" text,
    "engine_version" varchar NOT NULL,
    "author_id" varchar(36) NOT NULL REFERENCES "user" ("id"),
    "note" varchar NOT NULL DEFAULT '',
    "fingerprint" varchar(64) NOT NULL,
    "status" varchar NOT NULL DEFAULT 'draft',
    "reviewer_id" varchar(36) REFERENCES "user" ("id"),
    "submitted_at" timestamptz,
    "created_at" timestamptz NOT NULL DEFAULT now()
  )`,
  // Two saves racing for the same next number: the database lets exactly one in.
  `CREATE UNIQUE INDEX "idx_version_number" ON "calculation_version" ("calculation_id", "number")`,
  `CREATE INDEX "idx_version_fingerprint" ON "calculation_version" ("fingerprint")`,
  `CREATE INDEX "idx_version_status" ON "calculation_version" ("status")`,
  `CREATE TABLE "review" (
    "id" varchar(36) PRIMARY KEY NOT NULL,
    "version_id" varchar(36) NOT NULL REFERENCES "calculation_version" ("id"),
    "reviewer_id" varchar(36) NOT NULL REFERENCES "user" ("id"),
    "decision" varchar NOT NULL,
    "comment" varchar NOT NULL,
    "fingerprint" varchar(64) NOT NULL,
    "created_at" timestamptz NOT NULL DEFAULT now(),
    "calculation_title" varchar
  )`,
  `CREATE INDEX "idx_review_version" ON "review" ("version_id")`,
  `CREATE TABLE "review_comment" (
    "id" varchar(36) PRIMARY KEY NOT NULL,
    "calculation_id" varchar(36) NOT NULL REFERENCES "calculation" ("id") ON DELETE CASCADE,
    "version_number" integer NOT NULL,
    "author_id" varchar(36) NOT NULL REFERENCES "user" ("id"),
    "anchor_kind" varchar,
    "anchor_path" varchar,
    "body" text NOT NULL,
    "addressed_in_version" integer,
    "addressed_by" varchar(36) REFERENCES "user" ("id"),
    "addressed_at" timestamptz,
    "created_at" timestamptz NOT NULL DEFAULT now()
  )`,
  `CREATE INDEX "IDX_review_comment_calculation" ON "review_comment" ("calculation_id")`,
  `CREATE TABLE "attachment" (
    "id" varchar(36) PRIMARY KEY NOT NULL,
    "calculation_id" varchar(36) NOT NULL REFERENCES "calculation" ("id"),
    "fill_log_id" varchar(36),
    "version_number" integer,
    "sha256" varchar(64) NOT NULL,
    "size_bytes" integer NOT NULL,
    "media_type" varchar NOT NULL,
    "file_name" varchar NOT NULL,
    "uploaded_by" varchar(36) REFERENCES "user" ("id"),
    "created_at" timestamptz NOT NULL DEFAULT now()
  )`,
  `CREATE INDEX "idx_attachment_calculation" ON "attachment" ("calculation_id")`,
  `CREATE INDEX "idx_attachment_sha256" ON "attachment" ("sha256")`,
  `CREATE TABLE "envelope" (
    "id" varchar(36) PRIMARY KEY NOT NULL,
    "name" varchar NOT NULL,
    "kind" varchar NOT NULL CHECK ("kind" IN ('extensible', 'fixed')),
    "mass_kg" double precision NOT NULL,
    "burst_diameter_m" double precision,
    "rated_superpressure_pa" double precision,
    "drag_coefficient" double precision,
    "film" varchar NOT NULL DEFAULT '',
    "notes" varchar NOT NULL DEFAULT '',
    "version" integer NOT NULL DEFAULT 1,
    "created_by" varchar(36) REFERENCES "user" ("id"),
    "created_at" timestamptz NOT NULL DEFAULT now(),
    "updated_at" timestamptz NOT NULL DEFAULT now()
  )`,
  `CREATE TABLE "fill_log" (
    "id" varchar(36) PRIMARY KEY NOT NULL,
    "calculation_id" varchar(36) NOT NULL REFERENCES "calculation" ("id"),
    "version_number" integer NOT NULL,
    "created_by" varchar(36) NOT NULL REFERENCES "user" ("id"),
    "filled_at" varchar NOT NULL,
    "place" varchar NOT NULL DEFAULT '',
    "envelope_label" varchar NOT NULL DEFAULT '',
    "gas_source" varchar NOT NULL,
    "ambient" text NOT NULL,
    "readings" text NOT NULL,
    "note" varchar NOT NULL DEFAULT '',
    "outputs" text NOT NULL,
    "steps" text NOT NULL,
    "warnings" text NOT NULL,
    "points" text NOT NULL,
    "engine_version" varchar NOT NULL,
    "created_at" timestamptz NOT NULL DEFAULT now(),
    "updated_at" timestamptz NOT NULL DEFAULT now(),
    "instrument" text,
    "envelope_id" varchar(36) REFERENCES "envelope" ("id"),
    FOREIGN KEY ("calculation_id", "version_number")
      REFERENCES "calculation_version" ("calculation_id", "number")
  )`,
  `CREATE INDEX "idx_fill_log_calculation" ON "fill_log" ("calculation_id", "filled_at")`,
  `CREATE INDEX "idx_fill_log_envelope" ON "fill_log" ("envelope_id")`,
  `CREATE TABLE "gas_plan" (
    "id" varchar(36) PRIMARY KEY NOT NULL,
    "owner_id" varchar(36) NOT NULL REFERENCES "user" ("id"),
    "title" varchar NOT NULL,
    "event_date" varchar NOT NULL DEFAULT '',
    "inputs" text NOT NULL,
    "result" text NOT NULL,
    "engine_version" varchar NOT NULL,
    "created_at" timestamptz NOT NULL DEFAULT now(),
    "updated_at" timestamptz NOT NULL DEFAULT now()
  )`,
  `CREATE INDEX "idx_gas_plan_owner" ON "gas_plan" ("owner_id")`,
];

/** Classes, their rosters, published worked examples and exercise attempts. */
const CLASSROOM_TABLES = [
  `CREATE TABLE "classroom" (
    "id" varchar(36) PRIMARY KEY NOT NULL,
    "teacher_id" varchar(36) NOT NULL REFERENCES "user" ("id"),
    "title" varchar NOT NULL,
    "join_code" varchar(8) NOT NULL UNIQUE,
    "join_code_expires_at" timestamptz NOT NULL,
    "closed_at" timestamptz,
    "created_at" timestamptz NOT NULL DEFAULT now()
  )`,
  `CREATE INDEX "idx_classroom_teacher" ON "classroom" ("teacher_id")`,
  `CREATE TABLE "classroom_member" (
    "classroom_id" varchar(36) NOT NULL REFERENCES "classroom" ("id") ON DELETE CASCADE,
    "student_id" varchar(36) NOT NULL REFERENCES "user" ("id"),
    "joined_at" timestamptz NOT NULL DEFAULT now(),
    PRIMARY KEY ("classroom_id", "student_id")
  )`,
  `CREATE INDEX "idx_classroom_member_student" ON "classroom_member" ("student_id")`,
  `CREATE TABLE "worked_example" (
    "id" varchar(36) PRIMARY KEY NOT NULL,
    "classroom_id" varchar(36) NOT NULL REFERENCES "classroom" ("id") ON DELETE CASCADE,
    "teacher_id" varchar(36) NOT NULL REFERENCES "user" ("id"),
    "title" varchar NOT NULL,
    "intro" text NOT NULL DEFAULT '',
    "calculation_id" varchar(36) NOT NULL REFERENCES "calculation" ("id"),
    "version_number" integer NOT NULL,
    "kind" varchar NOT NULL,
    "inputs" text NOT NULL,
    "outputs" text NOT NULL,
    "steps" text NOT NULL,
    "warnings" text NOT NULL,
    "series" text,
    "engine_version" varchar NOT NULL,
    "fingerprint" varchar(64) NOT NULL,
    "step_notes" text NOT NULL,
    "try_ranges" text NOT NULL,
    "chart_step_id" varchar,
    "exercise" text,
    "published_at" timestamptz NOT NULL DEFAULT now(),
    "updated_at" timestamptz NOT NULL DEFAULT now()
  )`,
  `CREATE INDEX "IDX_worked_example_classroom" ON "worked_example" ("classroom_id")`,
  `CREATE TABLE "exercise_submission" (
    "id" varchar(36) PRIMARY KEY NOT NULL,
    "example_id" varchar(36) NOT NULL REFERENCES "worked_example" ("id") ON DELETE CASCADE,
    "student_id" varchar(36) NOT NULL REFERENCES "user" ("id"),
    "attempt" integer NOT NULL,
    "answers" text NOT NULL,
    "check" text NOT NULL,
    "correct_count" integer NOT NULL,
    "answer_count" integer NOT NULL,
    "all_correct" boolean NOT NULL,
    "submitted_at" timestamptz NOT NULL DEFAULT now()
  )`,
  `CREATE INDEX "IDX_exercise_submission_example_student" ON "exercise_submission" ("example_id", "student_id")`,
];
