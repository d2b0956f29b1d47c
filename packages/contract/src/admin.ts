import type { UserRef } from './common.js';
import type { Account } from './users.js';

/** An account as GET /api/admin/users lists it. */
export type AdminUser = Account;

/** One change an audit entry records, old and new in words. */
export interface AuditChange {
  label: string;
  from: string | null;
  to: string | null;
}

/** GET /api/admin/audit items: who by name, what as a sentence, changes as old → new. */
export interface AuditRow {
  id: number;
  createdAt: string;
  action: string;
  actor: UserRef | null;
  /** The entry as a sentence, with names and titles. */
  summary: string;
  changes: AuditChange[];
  targetType: string;
  targetId: string | null;
  /** The recorded detail, for programs; the web shows `summary` and `changes`. */
  detail: Record<string, unknown> | null;
}

/** GET /api/admin/audit/actions: each action the trail records, in words. */
export interface AuditAction {
  action: string;
  words: string;
}

/** GET /api/admin/audit query: both ends of the time range included. */
export interface AuditQuery {
  page?: number;
  pageSize?: number;
  action?: string;
  actorId?: string;
  /** ISO 8601 times. */
  from?: string;
  to?: string;
}

/** GET /api/admin/outbox items: a message the built-in mail server received. */
export interface OutboxMessage {
  id: number;
  from: string;
  to: string[];
  subject: string;
  text: string;
  /** Names, types and sizes of what was attached (the server keeps no bytes). */
  attachments: { filename: string; contentType: string; sizeBytes: number }[];
  receivedAt: string;
}

/** GET /api/health; a 503 carries the same report. */
export interface HealthReport {
  status: 'ok' | 'error';
  version: string;
  engineVersion: string;
  database: 'ok' | 'error';
  databaseCreatedAt?: string;
  pendingMigrations?: boolean;
}
