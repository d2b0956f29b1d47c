import type { NumberFormat, UnitSystem } from '@loftwright/buoyancy';

/** What a person may do; one person may hold several roles. */
export const ROLES = ['admin', 'designer', 'reviewer', 'teacher', 'student'] as const;
export type Role = (typeof ROLES)[number];

export type { NumberFormat, UnitSystem };

/** The preferences kept on an account; PATCH /api/auth/me/preferences changes any of them. */
export interface Preferences {
  unitSystem: UnitSystem;
  /** How the person writes numbers: 1,234.5 (point-comma), 1 234,5 (comma-space), 1.234,5. */
  numberFormat: NumberFormat;
  /** ISO 4217 code, upper case: the default currency of new gas plans and prices. */
  currency: string;
}

/**
 * What an account may do across the product, as the API decides from its roles; the web offers
 * pages and actions from these alone.
 */
export interface AccountPermissions {
  /** Start calculations and save versions of their own. */
  createCalculations: boolean;
  /** Keep gas plans (an admin sees everyone's). */
  planGas: boolean;
  /** Take versions from the review queue. */
  review: boolean;
  /** Open classes and publish worked examples to them. */
  runClasses: boolean;
  /** Join a class with a code. */
  joinClasses: boolean;
  /** Has classes to look at: teaching, learning or overseeing them. */
  seeClasses: boolean;
  /** Manage people's roles, read the audit trail and the outbox. */
  administer: boolean;
  /** Read the team's envelope library and choose from it in calculations and fill logs. */
  seeEnvelopes: boolean;
  /** Add, change and remove envelopes of the library. */
  manageEnvelopes: boolean;
}

/** An account as the API shows it (GET /api/auth/me, the admin list): never a password hash. */
export interface Account extends Preferences {
  id: string;
  email: string;
  displayName: string;
  roles: Role[];
  permissions: AccountPermissions;
  createdAt: string;
}

export interface SignedIn {
  accessToken: string;
  user: Account;
}

/** What POST /api/auth/register did: signed in the first account, or mailed the address. */
export type RegisterOutcome =
  ({ status: 'signed-in' } & SignedIn) | { status: 'check-mail'; message: string };

/** POST /api/auth/login */
export interface SignInBody {
  email: string;
  password: string;
}

/** POST /api/auth/register */
export interface RegisterBody extends SignInBody {
  displayName: string;
  /** A class join code: the account becomes a student account in that class. */
  joinCode?: string;
  /** As guessed from the browser's locale. */
  numberFormat?: NumberFormat;
}

/** POST /api/auth/register/confirm */
export interface ConfirmRegistrationBody {
  token: string;
}

/** POST /api/auth/password-reset/request */
export interface PasswordResetRequestBody {
  email: string;
}

/** POST /api/auth/password-reset/confirm */
export interface PasswordResetConfirmBody {
  token: string;
  password: string;
}

/** A plain sentence for the person, where an answer carries nothing else. */
export interface Message {
  message: string;
}

/** PATCH /api/admin/users/:id */
export interface UpdateRolesBody {
  roles: Role[];
}
