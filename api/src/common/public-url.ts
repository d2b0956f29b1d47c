import { createParamDecorator, type ExecutionContext } from '@nestjs/common';
import type { Request } from 'express';

/**
 * The scheme and host the request came to ("https://loft.example.org"), as Express reads them
 * (behind a proxy, from its headers when TRUST_PROXY says to believe it).
 */
export const RequestOrigin = createParamDecorator((_: unknown, context: ExecutionContext) => {
  const request = context.switchToHttp().getRequest<Request>();
  return `${request.protocol}://${request.get('host') ?? 'localhost'}`;
});

/** Where people reach the product: PUBLIC_URL when set, else the host the request came to. */
export function publicBaseUrl(configured: string | undefined, requestOrigin: string): string {
  return (configured ?? requestOrigin).replace(/\/+$/, '');
}

/** The page that checks a fingerprint, with host, as printed on sign-off sheets. */
export function verifyUrl(baseUrl: string, fingerprint: string): string {
  return `${baseUrl}/verify/${fingerprint}`;
}

/**
 * Where links sent without a request (mail, join links) point: PUBLIC_URL when set, else this
 * server on its own port.
 */
export function configuredBaseUrl(config: {
  get(key: 'PUBLIC_URL', options: { infer: true }): string | undefined;
  get(key: 'PORT', options: { infer: true }): number;
}): string {
  return publicBaseUrl(
    config.get('PUBLIC_URL', { infer: true }),
    `http://localhost:${config.get('PORT', { infer: true })}`,
  );
}
