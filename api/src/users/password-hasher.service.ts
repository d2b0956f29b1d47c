import { Injectable } from '@nestjs/common';
import { ConfigService } from '@nestjs/config';
import bcrypt from 'bcryptjs';
import { randomBytes, scrypt, timingSafeEqual } from 'node:crypto';
import type { EnvironmentVariables } from '../config/env.validation';

const SCRYPT_PREFIX = 'scrypt';
const BLOCK_SIZE = 8;
const PARALLELISM = 1;
const KEY_BYTES = 32;
const SALT_BYTES = 16;

/**
 * Hashes running at once. libuv has 4 worker threads by default, shared with file, compression
 * and DNS work that every other request may wait on; hashing takes at most two of them, so a burst
 * of sign-ins queues here instead of stalling everyone else (docs/performance.md).
 */
const CONCURRENT_HASHES = 2;
let hashesRunning = 0;
const waitingHashes: (() => void)[] = [];

async function withHashSlot<T>(work: () => Promise<T>): Promise<T> {
  if (hashesRunning >= CONCURRENT_HASHES) {
    await new Promise<void>((resolve) => waitingHashes.push(resolve));
  } else {
    hashesRunning += 1;
  }
  try {
    return await work();
  } finally {
    // The slot passes straight to the next waiting hash, or is freed.
    const next = waitingHashes.shift();
    if (next) next();
    else hashesRunning -= 1;
  }
}

/** scrypt through Node's asynchronous implementation, which runs on libuv's worker threads. */
function scryptAsync(password: string, salt: Buffer, log2N: number): Promise<Buffer> {
  return withHashSlot(() => scryptOnWorker(password, salt, log2N));
}

function scryptOnWorker(password: string, salt: Buffer, log2N: number): Promise<Buffer> {
  const N = 2 ** log2N;
  return new Promise((resolve, reject) =>
    scrypt(
      password,
      salt,
      KEY_BYTES,
      // Memory is 128·N·r bytes; allow that and a little more.
      { N, r: BLOCK_SIZE, p: PARALLELISM, maxmem: 129 * N * BLOCK_SIZE },
      (error, key) => (error ? reject(error) : resolve(key)),
    ),
  );
}

/** What a stored hash says of a password. */
export interface PasswordCheck {
  readonly matches: boolean;
  /** The hash is of an older kind or cost; store a new one now that the password is known. */
  readonly needsRehash: boolean;
}

/**
 * Password hashes: scrypt (RFC 7914) with a random salt, stored as
 * `scrypt$<log2 N>$<r>$<p>$<salt>$<key>` in base64url. Hashing and checking run off the event
 * loop, so sign-ins and registrations do not stall other requests. Hashes made earlier with
 * bcrypt (bcryptjs) still verify and are replaced at the next sign-in.
 */
@Injectable()
export class PasswordHasher {
  private readonly log2N: number;
  // A real hash to compare against when the account does not exist, so a wrong e-mail takes as
  // long as a wrong password and the answer cannot tell them apart.
  private readonly dummyHash: Promise<string>;

  constructor(config: ConfigService<EnvironmentVariables, true>) {
    this.log2N = config.get('SCRYPT_COST', { infer: true });
    this.dummyHash = this.hash('no account has this password');
  }

  async hash(password: string): Promise<string> {
    const salt = randomBytes(SALT_BYTES);
    const key = await scryptAsync(password, salt, this.log2N);
    return [
      SCRYPT_PREFIX,
      this.log2N,
      BLOCK_SIZE,
      PARALLELISM,
      salt.toString('base64url'),
      key.toString('base64url'),
    ].join('$');
  }

  async check(password: string, hash: string | undefined): Promise<PasswordCheck> {
    if (hash?.startsWith('$2')) {
      // bcrypt from before: checked once more on the main thread, then replaced.
      const matches = await bcrypt.compare(password, hash);
      return { matches, needsRehash: matches };
    }
    const stored = hash ?? (await this.dummyHash);
    const [prefix, log2N, r, p, salt, key] = stored.split('$');
    if (prefix !== SCRYPT_PREFIX || r !== String(BLOCK_SIZE) || p !== String(PARALLELISM)) {
      return { matches: false, needsRehash: false };
    }
    const expected = Buffer.from(key ?? '', 'base64url');
    const actual = await scryptAsync(password, Buffer.from(salt ?? '', 'base64url'), Number(log2N));
    const matches =
      hash !== undefined && expected.length === actual.length && timingSafeEqual(expected, actual);
    return { matches, needsRehash: matches && Number(log2N) !== this.log2N };
  }
}
