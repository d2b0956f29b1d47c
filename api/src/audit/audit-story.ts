import type { AuditChange } from '@loftwright/contract';
import type { AuditEntry } from './audit-entry.entity';

/** A field that changed, as a person reads it: "Title: Old → New". */
export type { AuditChange } from '@loftwright/contract';

/** Names of the people and things an entry mentions, looked up once for a page of entries. */
export interface AuditNames {
  person(id: string | null | undefined): string | null;
  /** The title of a calculation, class, gas plan or worked example, by its table and id. */
  thing(type: string, id: string | null | undefined): string | null;
}

/** Every action the trail records, in words, for filters and for the summaries below. */
export const AUDIT_ACTIONS: Record<string, string> = {
  'auth.register-request': 'asked for an account',
  'auth.register': 'created an account',
  'auth.sign-in': 'signed in',
  'auth.sign-in-failed': 'failed to sign in',
  'auth.sign-out': 'signed out',
  'auth.password-reset-request': 'asked for a password reset',
  'auth.password-reset': 'reset a password',
  'user.roles-change': 'changed roles',
  'calculation.create': 'created a calculation',
  'calculation.save': 'saved a version',
  'calculation.update': 'changed a calculation’s details',
  'calculation.archive': 'archived a calculation',
  'version.submit': 'submitted a version for review',
  'version.approve': 'approved a version',
  'version.send-back': 'sent a version back',
  'comment.add': 'commented on a version',
  'comment.addressed': 'marked a comment addressed',
  'attachment.add': 'added a file',
  'attachment.remove': 'removed a file',
  'fill-log.create': 'logged a fill',
  'fill-log.update': 'changed a fill log',
  'fill-log.import-readings': 'imported readings',
  'fill-log.remove': 'removed a fill log',
  'plan.create': 'created a gas plan',
  'plan.update': 'changed a gas plan',
  'plan.remove': 'removed a gas plan',
  'envelope.create': 'added an envelope to the library',
  'envelope.update': 'changed a library envelope',
  'envelope.remove': 'removed a library envelope',
  'classroom.create': 'created a class',
  'classroom.join': 'joined a class',
  'classroom.renew-code': 'renewed a join code',
  'classroom.remove-student': 'removed a student',
  'classroom.close': 'closed a class',
  'example.publish': 'published a worked example',
  'example.update': 'changed a worked example',
  'example.remove': 'removed a worked example',
  'example.submit': 'answered an exercise',
};

const ROLE_WORDS: Record<string, string> = {
  admin: 'admin',
  designer: 'designer',
  reviewer: 'reviewer',
  teacher: 'teacher',
  student: 'student',
};

const FIELD_LABELS: Record<string, string> = {
  title: 'Title',
  visibility: 'Visibility',
  tags: 'Tags',
  intro: 'Introduction',
  stepNotes: 'Step notes',
  tryRanges: 'Try-it ranges',
  chartStepId: 'Chart step',
  exercise: 'Exercise settings',
  readings: 'Readings',
  note: 'Note',
};

const quoted = (title: string | null) => (title ? `“${title}”` : 'a calculation no longer listed');
const list = (values: unknown) =>
  Array.isArray(values) ? values.map(String).join(', ') || 'none' : String(values ?? '');
const text = (value: unknown): string | null =>
  value === null || value === undefined
    ? null
    : Array.isArray(value)
      ? list(value)
      : typeof value === 'object'
        ? 'changed'
        : String(value);

/**
 * One entry as a sentence and its changes: "Ilse Varga approved version 3 of “Harbour sphere”",
 * "Ada Marlowe changed Ilse Varga’s roles: added reviewer". Never an id, a code or raw JSON.
 */
export function auditStory(
  entry: AuditEntry,
  names: AuditNames,
): { summary: string; changes: AuditChange[] } {
  const detail = entry.detail ?? {};
  const actor = names.person(entry.actorId) ?? 'Someone';
  const calculation = () =>
    quoted(
      names.thing(
        'calculation',
        entry.targetType === 'calculation' ? entry.targetId : (detail.calculationId as string),
      ),
    );
  const version = detail.number ?? detail.version ?? detail.versionNumber;
  const email = typeof detail.email === 'string' ? detail.email : 'an address';
  switch (entry.action) {
    case 'auth.register-request':
      return { summary: `An account was asked for ${email}`, changes: [] };
    case 'auth.sign-in-failed':
      return { summary: `A sign-in as ${email} failed`, changes: [] };
    case 'auth.password-reset-request':
      return { summary: `A password reset was asked for ${email}`, changes: [] };
    case 'user.roles-change': {
      const before = Array.isArray(detail.before) ? detail.before.map(String) : [];
      const after = Array.isArray(detail.after) ? detail.after.map(String) : [];
      const added = after.filter((role) => !before.includes(role));
      const removed = before.filter((role) => !after.includes(role));
      const parts = [
        ...(added.length
          ? [`added ${added.map((role) => ROLE_WORDS[role] ?? role).join(', ')}`]
          : []),
        ...(removed.length
          ? [`removed ${removed.map((role) => ROLE_WORDS[role] ?? role).join(', ')}`]
          : []),
      ];
      const whose = names.person(entry.targetId) ?? 'a user';
      return {
        summary: `${actor} changed ${whose}’s roles: ${parts.join('; ') || 'no change'}`,
        changes: [{ label: 'Roles', from: list(before), to: list(after) }],
      };
    }
    case 'calculation.save':
      return {
        summary: `${actor} saved version ${String(version)} of ${calculation()}`,
        changes: [],
      };
    case 'calculation.update': {
      // Entries since this reader record { field: { from, to } }; older ones only the new values.
      const changed = (detail.changes ?? detail) as Record<string, unknown>;
      const changes = Object.entries(changed).map(([field, value]) => {
        const pair =
          value && typeof value === 'object' && !Array.isArray(value) && 'to' in value
            ? (value as { from?: unknown; to?: unknown })
            : { from: undefined, to: value };
        return { label: FIELD_LABELS[field] ?? field, from: text(pair.from), to: text(pair.to) };
      });
      return { summary: `${actor} changed the details of ${calculation()}`, changes };
    }
    case 'version.submit': {
      const reviewer = names.person(detail.reviewerId as string | null);
      return {
        summary: `${actor} submitted version ${String(version)} of ${calculation()} to ${reviewer ?? 'any reviewer'}`,
        changes: [],
      };
    }
    case 'version.approve':
    case 'version.send-back':
      return {
        summary: `${actor} ${entry.action === 'version.approve' ? 'approved' : 'sent back'} version ${String(version)} of ${calculation()}`,
        changes: [],
      };
    case 'comment.add':
      return {
        summary: `${actor} commented on version ${String(version)} of ${calculation()}`,
        changes: [],
      };
    case 'comment.addressed':
      return {
        summary: `${actor} marked a comment on ${calculation()} addressed in version ${String(version)}`,
        changes: [],
      };
    case 'attachment.add':
    case 'attachment.remove':
      return {
        summary: `${actor} ${entry.action === 'attachment.add' ? 'added' : 'removed'} the file ${String(detail.fileName ?? '')} ${entry.action === 'attachment.add' ? 'to' : 'from'} ${calculation()}`,
        changes: [],
      };
    case 'classroom.remove-student':
      return {
        summary: `${actor} removed ${names.person(detail.studentId as string) ?? 'a student'} from the class ${quoted(names.thing('classroom', entry.targetId))}`,
        changes: [],
      };
    case 'example.update':
      return {
        summary: `${actor} changed the worked example ${quoted(names.thing('worked_example', entry.targetId))}`,
        changes: (Array.isArray(detail.changed) ? detail.changed : []).map((field) => ({
          label: FIELD_LABELS[String(field)] ?? String(field),
          from: null,
          to: 'changed',
        })),
      };
    case 'example.submit':
      return {
        summary: `${actor} answered the exercise ${quoted(names.thing('worked_example', entry.targetId))}: ${String(detail.correct)} of ${String(detail.of)} right`,
        changes: [],
      };
    default: {
      const words = AUDIT_ACTIONS[entry.action] ?? 'did something';
      const target = names.thing(entry.targetType, entry.targetId);
      return { summary: `${actor} ${words}${target ? `: ${quoted(target)}` : ''}`, changes: [] };
    }
  }
}
