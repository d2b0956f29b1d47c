import { Global, Module } from '@nestjs/common';
import { WriteLock } from './write-lock';

/**
 * Helpers every service that writes uses (the write queue, row inserts). The database's own setup
 * (connection options, the entity list, migrations) stays in `database/`.
 */
@Global()
@Module({ providers: [WriteLock], exports: [WriteLock] })
export class PersistenceModule {}
