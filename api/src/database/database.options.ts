import { resolve } from 'node:path';
import type { DataSourceOptions } from 'typeorm';
import { Attachment } from '../attachments/attachment.entity';
import { AuditEntry } from '../audit/audit-entry.entity';
import { createPrivateFile, preparePrivateDataDir } from '../config/data-dir';
import { PasswordResetToken } from '../auth/password-reset-token.entity';
import { PendingRegistration } from '../auth/pending-registration.entity';
import { CalculationVersion } from '../calculations/calculation-version.entity';
import { Calculation } from '../calculations/calculation.entity';
import { ClassroomMember } from '../classrooms/classroom-member.entity';
import { Classroom } from '../classrooms/classroom.entity';
import { FillLog } from '../fill-logs/fill-log.entity';
import { GasPlanRecord } from '../plans/plan.entity';
import { Installation } from '../health/installation.entity';
import { OutboxMessage } from '../mail/outbox-message.entity';
import { Review } from '../reviews/review.entity';
import { ReviewComment } from '../reviews/review-comment.entity';
import { User } from '../users/user.entity';
import { ExerciseSubmission } from '../worked-examples/exercise-submission.entity';
import { WorkedExample } from '../worked-examples/worked-example.entity';
import { InitSchema1764633600000 } from './migrations/1764633600000-init-schema';
import { AccountsCalculationsReviews1764640800000 } from './migrations/1764640800000-accounts-calculations-reviews';
import { Attachments1764720000000 } from './migrations/1764720000000-attachments';
import { FillLogs1764723600000 } from './migrations/1764723600000-fill-logs';
import { OutboxAttachments1764727200000 } from './migrations/1764727200000-outbox-attachments';
import { GasPlans1764730800000 } from './migrations/1764730800000-gas-plans';
import { Classrooms1764734400000 } from './migrations/1764734400000-classrooms';
import { UserNumberFormatCurrency1764738000000 } from './migrations/1764738000000-user-number-format-currency';
import { FillLogInstrument1764741600000 } from './migrations/1764741600000-fill-log-instrument';
import { ReviewCalculationTitle1764745200000 } from './migrations/1764745200000-review-calculation-title';
import { PendingRegistration1764748800000 } from './migrations/1764748800000-pending-registration';
import { ReviewComments1764752400000 } from './migrations/1764752400000-review-comments';
import { CalculationLinks1764759600000 } from './migrations/1764759600000-calculation-links';
import { EnvelopeLibrary1764756000000 } from './migrations/1764756000000-envelope-library';
import { Envelope } from '../envelopes/envelope.entity';
import { AppSetting } from '../auth/app-setting.entity';
import { RateLimitWindow } from '../auth/rate-limit-window.entity';
import { SharedInstanceState1764763200000 } from './migrations/1764763200000-shared-instance-state';

import { DATABASE_KIND, databaseKindOf } from './database-kind';
import { migrationsFor } from './migration-sets';

export const DATABASE_FILE_NAME = 'loftwright.sqlite';

export const ENTITIES = [
  Installation,
  User,
  PasswordResetToken,
  PendingRegistration,
  Calculation,
  CalculationVersion,
  Review,
  ReviewComment,
  AuditEntry,
  OutboxMessage,
  Attachment,
  FillLog,
  GasPlanRecord,
  Classroom,
  ClassroomMember,
  WorkedExample,
  ExerciseSubmission,
  Envelope,
  AppSetting,
  RateLimitWindow,
];
export const MIGRATIONS = [
  InitSchema1764633600000,
  AccountsCalculationsReviews1764640800000,
  Attachments1764720000000,
  FillLogs1764723600000,
  OutboxAttachments1764727200000,
  GasPlans1764730800000,
  Classrooms1764734400000,
  UserNumberFormatCurrency1764738000000,
  FillLogInstrument1764741600000,
  ReviewCalculationTitle1764745200000,
  PendingRegistration1764748800000,
  ReviewComments1764752400000,
  EnvelopeLibrary1764756000000,
  CalculationLinks1764759600000,
  SharedInstanceState1764763200000,
];

/**
 * TypeORM options for the SQLite file under `dataDir`, or for the PostgreSQL database
 * DATABASE_URL names. Schema changes come only from migrations, which run on start;
 * `synchronize` stays off so a model change can never silently alter a team's stored
 * calculations.
 */
export function buildDataSourceOptions(
  dataDir: string,
  databaseUrl: string | undefined = process.env.DATABASE_URL,
): DataSourceOptions {
  const directory = preparePrivateDataDir(dataDir);
  const kind = databaseKindOf(databaseUrl);
  // Entities took their column types from the environment when they were loaded.
  if (kind !== DATABASE_KIND) {
    throw new Error(`DATABASE_URL changed after start: entities were set up for ${DATABASE_KIND}`);
  }
  if (kind === 'postgres') return postgresOptions(databaseUrl as string);
  // SQLite gives its -wal and -shm files the database file's permissions.
  createPrivateFile(resolve(directory, DATABASE_FILE_NAME));
  return {
    type: 'better-sqlite3',
    database: resolve(directory, DATABASE_FILE_NAME),
    entities: ENTITIES,
    migrations: migrationsFor('sqlite', MIGRATIONS),
    migrationsRun: true,
    synchronize: false,
    // WAL keeps readers going while a save commits; foreign keys are off by default in SQLite.
    // synchronous = FULL syncs the WAL on every commit, so an acknowledged save survives a crash
    // or power loss (NORMAL would survive a process crash only). See docs/architecture.md.
    prepareDatabase: (db: { pragma(source: string): unknown }) => {
      db.pragma('journal_mode = WAL');
      db.pragma('synchronous = FULL');
      db.pragma('foreign_keys = ON');
      db.pragma('busy_timeout = 5000');
    },
  };
}

/**
 * PostgreSQL: its own baseline migration, then the portable ones (migration-sets.ts). Several
 * API instances may share the database; a save that loses a race to another instance is
 * refused by the unique (calculation, number) index and answered 409 (database-errors.ts).
 */
function postgresOptions(url: string): DataSourceOptions {
  return {
    type: 'postgres',
    url,
    entities: ENTITIES,
    migrations: migrationsFor('postgres', MIGRATIONS),
    migrationsRun: true,
    synchronize: false,
  };
}

/** Where the data is kept, for the start-up log: the SQLite file, or the server without password. */
export function describeDatabase(dataDir: string, databaseUrl = process.env.DATABASE_URL): string {
  if (databaseKindOf(databaseUrl) === 'sqlite') return resolve(dataDir, DATABASE_FILE_NAME);
  const url = new URL(databaseUrl as string);
  return `PostgreSQL ${url.hostname}:${url.port || '5432'}${url.pathname}`;
}
