import { ValidationPipe } from '@nestjs/common';
import { ConfigService } from '@nestjs/config';
import type { NestExpressApplication } from '@nestjs/platform-express';
import helmet from 'helmet';
import { API_PREFIX } from './app.constants';
import type { EnvironmentVariables } from './config/env.validation';
import { DEFAULT_WEB_DIST_DIR, serveWebApp } from './web/serve-web-app';

/**
 * Everything main.ts and the API tests share, so the tests run the app as it ships: prefix,
 * validation, security headers and the web app.
 */
export function configureApp(app: NestExpressApplication): void {
  const config = app.get<ConfigService<EnvironmentVariables, true>>(ConfigService);
  app.use(
    helmet({
      // Loftwright serves plain HTTP on a workshop or classroom network unless a proxy in front of it
      // adds TLS, so it must not tell browsers to switch to HTTPS on their own.
      strictTransportSecurity: false,
      contentSecurityPolicy: {
        directives: {
          'upgrade-insecure-requests': null,
          // antd writes its styles at run time; fonts and images are bundled, never fetched.
          'style-src': ["'self'", "'unsafe-inline'"],
          'font-src': ["'self'", 'data:'],
          'img-src': ["'self'", 'data:', 'blob:'],
        },
      },
    }),
  );
  app.setGlobalPrefix(API_PREFIX);
  app.useGlobalPipes(
    new ValidationPipe({ whitelist: true, forbidNonWhitelisted: true, transform: true }),
  );
  app.enableShutdownHooks();
  serveWebApp(app, config.get('WEB_DIST_DIR', { infer: true }) ?? DEFAULT_WEB_DIST_DIR);
}
