import type { EntityManager } from 'typeorm';
import { AppSetting, FIRST_ACCOUNT_SETTING } from '../auth/app-setting.entity';

/**
 * Claims "first account of this database" for `userId` unless an account already has it, and
 * says whether this one did. One row with a fixed primary key holds the claim, so the database
 * decides, whichever API instance asks: the insert is INSERT … ON CONFLICT DO NOTHING (INSERT OR
 * IGNORE on SQLite), and of inserts racing only one writes the row; the others read its holder.
 *
 * Call it first in the account's transaction: as a write it takes SQLite's write lock at once,
 * so nothing read later in the transaction can be changed by another process before the commit,
 * and if the account is not saved the claim rolls back with it.
 */
export async function claimFirstAccount(manager: EntityManager, userId: string): Promise<boolean> {
  const settings = manager.getRepository(AppSetting);
  await settings
    .createQueryBuilder()
    .insert()
    .values({ key: FIRST_ACCOUNT_SETTING, value: userId })
    .orIgnore()
    .execute();
  const holder = await settings.findOneByOrFail({ key: FIRST_ACCOUNT_SETTING });
  return holder.value === userId;
}
