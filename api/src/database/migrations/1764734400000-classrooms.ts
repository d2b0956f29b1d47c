import type { MigrationInterface, QueryRunner } from 'typeorm';

/** Classes with join codes and rosters, worked examples published to them, exercise attempts. */
export class Classrooms1764734400000 implements MigrationInterface {
  name = 'Classrooms1764734400000';

  async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`
      CREATE TABLE "classroom" (
        "id" varchar(36) PRIMARY KEY NOT NULL,
        "teacher_id" varchar(36) NOT NULL REFERENCES "user" ("id"),
        "title" varchar NOT NULL,
        "join_code" varchar(8) NOT NULL UNIQUE,
        "join_code_expires_at" datetime NOT NULL,
        "closed_at" datetime,
        "created_at" datetime NOT NULL DEFAULT (datetime('now'))
      )`);
    await queryRunner.query(`CREATE INDEX "idx_classroom_teacher" ON "classroom" ("teacher_id")`);
    await queryRunner.query(`
      CREATE TABLE "classroom_member" (
        "classroom_id" varchar(36) NOT NULL REFERENCES "classroom" ("id") ON DELETE CASCADE,
        "student_id" varchar(36) NOT NULL REFERENCES "user" ("id"),
        "joined_at" datetime NOT NULL DEFAULT (datetime('now')),
        PRIMARY KEY ("classroom_id", "student_id")
      )`);
    await queryRunner.query(
      `CREATE INDEX "idx_classroom_member_student" ON "classroom_member" ("student_id")`,
    );
    await queryRunner.query(`
      CREATE TABLE "worked_example" (
        "id" varchar(36) PRIMARY KEY NOT NULL,
        "classroom_id" varchar(36) NOT NULL REFERENCES "classroom" ("id") ON DELETE CASCADE,
        "teacher_id" varchar(36) NOT NULL REFERENCES "user" ("id"),
        "title" varchar NOT NULL,
        "intro" text NOT NULL DEFAULT (''),
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
        "published_at" datetime NOT NULL DEFAULT (datetime('now')),
        "updated_at" datetime NOT NULL DEFAULT (datetime('now'))
      )`);
    await queryRunner.query(
      `CREATE INDEX "IDX_worked_example_classroom" ON "worked_example" ("classroom_id")`,
    );
    // The copied calculation content never changes once published, as for calculation versions.
    await queryRunner.query(`
      CREATE TRIGGER "trg_worked_example_content_immutable"
      BEFORE UPDATE OF "calculation_id", "version_number", "kind", "inputs", "outputs", "steps",
        "warnings", "series", "engine_version", "fingerprint" ON "worked_example"
      BEGIN
        SELECT RAISE(ABORT, 'worked example content is immutable');
      END`);
    await queryRunner.query(`
      CREATE TABLE "exercise_submission" (
        "id" varchar(36) PRIMARY KEY NOT NULL,
        "example_id" varchar(36) NOT NULL REFERENCES "worked_example" ("id") ON DELETE CASCADE,
        "student_id" varchar(36) NOT NULL REFERENCES "user" ("id"),
        "attempt" integer NOT NULL,
        "answers" text NOT NULL,
        "check" text NOT NULL,
        "correct_count" integer NOT NULL,
        "answer_count" integer NOT NULL,
        "all_correct" boolean NOT NULL,
        "submitted_at" datetime NOT NULL DEFAULT (datetime('now'))
      )`);
    await queryRunner.query(
      `CREATE INDEX "IDX_exercise_submission_example_student" ON "exercise_submission" ("example_id", "student_id")`,
    );
  }

  async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`DROP TABLE "exercise_submission"`);
    await queryRunner.query(`DROP TABLE "worked_example"`);
    await queryRunner.query(`DROP TABLE "classroom_member"`);
    await queryRunner.query(`DROP TABLE "classroom"`);
  }
}
