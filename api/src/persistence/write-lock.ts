import { Injectable } from '@nestjs/common';
import { InjectDataSource } from '@nestjs/typeorm';
import { DataSource, type EntityManager } from 'typeorm';

/**
 * Runs database writes one at a time. SQLite has one writer and TypeORM talks to it over a single
 * connection, where a statement issued while another request's transaction is open would join
 * that transaction (and roll back with it). Queuing every write keeps each request's changes its
 * own and makes "check the base version, then insert" atomic.
 */
@Injectable()
export class WriteLock {
  private tail: Promise<unknown> = Promise.resolve();

  constructor(@InjectDataSource() private readonly dataSource: DataSource) {}

  run<T>(work: () => Promise<T>): Promise<T> {
    const result = this.tail.then(work, work);
    this.tail = result.catch(() => undefined);
    return result;
  }

  /**
   * Runs `work` in its turn and in one transaction: a change and its audit record commit
   * together or not at all, whatever stops the process between them.
   */
  transaction<T>(
    work: (manager: EntityManager) => Promise<T>,
    /** Still in this turn, once committed: work outside the database (files) that follows it. */
    afterCommit?: (result: T) => Promise<void>,
  ): Promise<T> {
    return this.run(async () => {
      const result = await this.dataSource.transaction(work);
      if (afterCommit) await afterCommit(result);
      return result;
    });
  }
}
