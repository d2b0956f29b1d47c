import { Column, Entity, PrimaryColumn } from 'typeorm';

/**
 * A value every API instance must agree on, kept in the database rather than in one process or one
 * instance's folder: the generated token-signing key, the claim of the first account.
 */
@Entity('app_setting')
export class AppSetting {
  @PrimaryColumn('varchar', { length: 100 })
  key: string;

  @Column('text')
  value: string;
}

/** The generated signing key (only when JWT_SECRET is unset). */
export const JWT_SECRET_SETTING = 'jwt-secret';

/** Holds the id of the account that became the first one (and so the first admin). */
export const FIRST_ACCOUNT_SETTING = 'first-account';
