import { Injectable } from '@nestjs/common';
import { ConfigService } from '@nestjs/config';
import bcrypt from 'bcryptjs';
import type { EnvironmentVariables } from '../config/env.validation';

/** bcrypt through bcryptjs; the cost comes from the environment (12 or more outside tests). */
@Injectable()
export class PasswordHasher {
  private readonly cost: number;
  // A real hash to compare against when the account does not exist, so a wrong e-mail takes as
  // long as a wrong password and the answer cannot tell them apart.
  private readonly dummyHash: Promise<string>;

  constructor(config: ConfigService<EnvironmentVariables, true>) {
    this.cost = config.get('BCRYPT_COST', { infer: true });
    this.dummyHash = bcrypt.hash('no account has this password', this.cost);
  }

  hash(password: string): Promise<string> {
    return bcrypt.hash(password, this.cost);
  }

  async verify(password: string, hash: string | undefined): Promise<boolean> {
    const matches = await bcrypt.compare(password, hash ?? (await this.dummyHash));
    return hash !== undefined && matches;
  }
}
