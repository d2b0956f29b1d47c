import { Global, Module } from '@nestjs/common';
import { WriteLock } from './write-lock';

@Global()
@Module({ providers: [WriteLock], exports: [WriteLock] })
export class DatabaseModule {}
