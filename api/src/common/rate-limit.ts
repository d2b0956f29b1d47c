import { applyDecorators, type ExecutionContext, SetMetadata, UseGuards } from '@nestjs/common';
import { ThrottlerGuard, type ThrottlerOptions } from '@nestjs/throttler';

const RATE_LIMIT_BUCKET = 'loftwright:rate-limit-bucket';

/** The routes that cost the server (a password hash, an engine run) or invite guessing. */
export type RateLimitBucket = 'sign-in' | 'register' | 'class-join' | 'evaluate';

/**
 * Counts requests to this route per client address in the bucket's window and answers 429 past
 * its limit. Each route keeps its own count, in the database (auth/database-throttler-storage.ts),
 * so every API instance behind a load balancer adds to the same count.
 */
export const RateLimited = (bucket: RateLimitBucket): ReturnType<typeof applyDecorators> =>
  applyDecorators(SetMetadata(RATE_LIMIT_BUCKET, bucket), UseGuards(ThrottlerGuard));

const bucketOf = (context: ExecutionContext): unknown =>
  Reflect.getMetadata(RATE_LIMIT_BUCKET, context.getHandler());

/** One throttler per bucket, each applied only to the routes marked with it. */
export function rateLimitThrottlers(
  limits: Record<RateLimitBucket, { limit: number; windowMs: number }>,
): ThrottlerOptions[] {
  return (Object.entries(limits) as [RateLimitBucket, { limit: number; windowMs: number }][]).map(
    ([bucket, { limit, windowMs }]) => ({
      name: bucket,
      ttl: windowMs,
      limit,
      skipIf: (context: ExecutionContext) => bucketOf(context) !== bucket,
    }),
  );
}
