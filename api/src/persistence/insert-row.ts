import type { DeepPartial, ObjectLiteral, Repository } from 'typeorm';
import type { QueryDeepPartialEntity } from 'typeorm/query-builder/QueryPartialEntity';

/**
 * Inserts one row. TypeORM's insert() types JSON columns recursively and refuses `unknown`
 * values (engine results); building the entity with create() first keeps the row checked
 * against the entity while letting JSON columns hold any value.
 */
export async function insertRow<T extends ObjectLiteral>(
  repository: Repository<T>,
  row: DeepPartial<T>,
): Promise<void> {
  await repository.insert(repository.create(row) as QueryDeepPartialEntity<T>);
}
