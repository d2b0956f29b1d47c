import {
  DeleteObjectCommand,
  GetObjectCommand,
  HeadObjectCommand,
  PutObjectCommand,
  type S3Client,
} from '@aws-sdk/client-s3';
import { createReadStream } from 'node:fs';
import { Readable } from 'node:stream';
import { checkedSha256, type ObjectStore, StoredObjectMissing } from './object-store';
import type { S3Location } from './storage-url';

/** What S3 (and compatible servers) answer for a key that is not there. */
const isNotFound = (error: unknown): boolean => {
  const failure = error as { name?: string; $metadata?: { httpStatusCode?: number } } | null;
  return (
    failure?.name === 'NoSuchKey' ||
    failure?.name === 'NotFound' ||
    failure?.$metadata?.httpStatusCode === 404
  );
};

/**
 * Objects in an S3 bucket under `prefix` + the same fan-out as on disk (`ab/abcdef…`), so a
 * bucket's listing reads like the local folder.
 */
export class S3ObjectStore implements ObjectStore {
  constructor(
    private readonly client: S3Client,
    readonly location: S3Location,
  ) {}

  /** Closes the client's kept-alive connections when the app stops. */
  onModuleDestroy(): void {
    this.client.destroy();
  }

  keyFor(sha256: string): string {
    return `${this.location.prefix}${checkedSha256(sha256).slice(0, 2)}/${sha256}`;
  }

  /**
   * Writes only when no object is there: content addressing means one already there holds the
   * same bytes. The length is sent, so the SDK streams the file in one PUT without buffering it.
   * S3 answers a PUT only once the object is durably stored.
   */
  async put(
    sha256: string,
    file: { readonly path: string; readonly sizeBytes: number },
  ): Promise<void> {
    if (await this.exists(sha256)) return;
    await this.client.send(
      new PutObjectCommand({
        Bucket: this.location.bucket,
        Key: this.keyFor(sha256),
        Body: createReadStream(file.path),
        ContentLength: file.sizeBytes,
        ContentType: 'application/octet-stream',
      }),
    );
  }

  async get(sha256: string): Promise<Readable> {
    try {
      const answer = await this.client.send(
        new GetObjectCommand({ Bucket: this.location.bucket, Key: this.keyFor(sha256) }),
      );
      // In Node the body is the HTTP response itself: handing it on streams, never buffers.
      if (!(answer.Body instanceof Readable)) throw new Error('S3 answered without a body stream');
      return answer.Body;
    } catch (error) {
      if (isNotFound(error)) throw new StoredObjectMissing(sha256);
      throw error;
    }
  }

  async exists(sha256: string): Promise<boolean> {
    try {
      await this.client.send(
        new HeadObjectCommand({ Bucket: this.location.bucket, Key: this.keyFor(sha256) }),
      );
      return true;
    } catch (error) {
      if (isNotFound(error)) return false;
      throw error;
    }
  }

  async delete(sha256: string): Promise<void> {
    // S3 answers 204 for a key that is not there too.
    await this.client.send(
      new DeleteObjectCommand({ Bucket: this.location.bucket, Key: this.keyFor(sha256) }),
    );
  }
}
