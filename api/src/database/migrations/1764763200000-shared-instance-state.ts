import { type MigrationInterface, type QueryRunner, Table, TableIndex } from 'typeorm';

/**
 * State every API instance must share, so several instances can run behind one load balancer:
 * settings (the generated signing key, the first-account claim) and the rate-limit counts.
 * Written with TypeORM's Table API so the same migration runs on SQLite and PostgreSQL.
 */
export class SharedInstanceState1764763200000 implements MigrationInterface {
  name = 'SharedInstanceState1764763200000';

  async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.createTable(
      new Table({
        name: 'app_setting',
        columns: [
          { name: 'key', type: 'varchar', length: '100', isPrimary: true },
          { name: 'value', type: 'text', isNullable: false },
        ],
      }),
    );
    await queryRunner.createTable(
      new Table({
        name: 'rate_limit_window',
        columns: [
          { name: 'key', type: 'varchar', length: '128', isPrimary: true },
          { name: 'window_start_ms', type: 'bigint', isNullable: false },
          { name: 'expires_at_ms', type: 'bigint', isNullable: false },
          { name: 'count', type: 'integer', isNullable: false },
        ],
      }),
    );
    await queryRunner.createIndex(
      'rate_limit_window',
      new TableIndex({ name: 'rate_limit_window_expires_at', columnNames: ['expires_at_ms'] }),
    );
    await this.claimFirstAccountOfExistingDatabase(queryRunner);
  }

  async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.dropTable('rate_limit_window');
    await queryRunner.dropTable('app_setting');
  }

  /**
   * A database that already has accounts has had its first account: the claim names the oldest,
   * so no later registration can become a second "first" admin.
   */
  private async claimFirstAccountOfExistingDatabase(queryRunner: QueryRunner): Promise<void> {
    const oldest = await queryRunner.manager
      .createQueryBuilder()
      .select('account.id', 'id')
      .from('user', 'account')
      .orderBy('account.created_at', 'ASC')
      .limit(1)
      .getRawOne<{ id: string }>();
    if (!oldest) return;
    await queryRunner.manager
      .createQueryBuilder()
      .insert()
      .into('app_setting', ['key', 'value'])
      .values({ key: 'first-account', value: oldest.id })
      .execute();
  }
}
