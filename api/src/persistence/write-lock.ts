import { Injectable } from '@nestjs/common';

/**
 * Runs database writes one at a time. SQLite has one writer and TypeORM talks to it over a single
 * connection, where a statement issued while another request's transaction is open would join
 * that transaction (and roll back with it). Queuing every write keeps each request's changes its
 * own and makes "check the base version, then insert" atomic.
 */
@Injectable()
export class WriteLock {
  private tail: Promise<unknown> = Promise.resolve();

  run<T>(work: () => Promise<T>): Promise<T> {
    const result = this.tail.then(work, work);
    this.tail = result.catch(() => undefined);
    return result;
  }
}
