import { ConfigService } from '@nestjs/config';
import { DocumentBuilder, SwaggerModule } from '@nestjs/swagger';
import type {
  NestExpressApplication,
  NestExpressBodyParserOptionsFor,
} from '@nestjs/platform-express';
import compression from 'compression';
import helmet from 'helmet';
import { API_PREFIX } from './app.constants';
import { API_VERSION } from './config/app-info';
import type { EnvironmentVariables } from './config/env.validation';
import { tileOrigin } from './client-config/map-tile-env';
import { ApiExceptionFilter } from './common/filters/api-exception.filter';
import { MAX_JSON_BODY, refuseDeepJson } from './common/json-depth';
import { createValidationPipe } from './common/pipes/api-validation.pipe';
import { DEFAULT_WEB_DIST_DIR, serveWebApp } from './web/serve-web-app';

/** The tile server's origin when MAP_TILE_URL is set (validated at start), else nothing. */
function mapTileOrigins(config: ConfigService<EnvironmentVariables, true>): string[] {
  const template = config.get('MAP_TILE_URL', { infer: true });
  const origin = template ? tileOrigin(template) : undefined;
  return origin ? [origin] : [];
}

/**
 * Everything main.ts and the API tests share, so the tests run the app as it ships: prefix,
 * validation, security headers and the web app.
 */
export function configureApp(app: NestExpressApplication): void {
  const config = app.get<ConfigService<EnvironmentVariables, true>>(ConfigService);
  // The web app's JavaScript is most of what a first visit downloads; gzip cuts it to about a
  // third. Responses under 1 kB are sent as they are.
  const trustProxy = config.get('TRUST_PROXY', { infer: true });
  if (trustProxy) {
    // Rate limits count per client address; behind a proxy that address comes from its header.
    app.set(
      'trust proxy',
      /^\d+$/.test(trustProxy)
        ? Number(trustProxy)
        : trustProxy.split(',').map((part) => part.trim()),
    );
  }
  app.use(compression());
  app.use(
    helmet({
      // Loftwright serves plain HTTP on a workshop or classroom network unless a proxy in front of it
      // adds TLS, so it must not tell browsers to switch to HTTPS on their own.
      strictTransportSecurity: false,
      contentSecurityPolicy: {
        directives: {
          'upgrade-insecure-requests': null,
          // antd writes its styles at run time; fonts and images are bundled, never fetched, but
          // for a configured base map's tiles, allowed from exactly that tile server.
          'style-src': ["'self'", "'unsafe-inline'"],
          'font-src': ["'self'", 'data:'],
          'img-src': ["'self'", 'data:', 'blob:', ...mapTileOrigins(config)],
        },
      },
    }),
  );
  // Calculation inputs are small; anything bigger or deeper is a mistake or an attack, refused
  // before it is parsed.
  // Nest's option type leaves out `verify` because it uses it itself for rawBody, which is off
  // here; body-parser receives the options as given.
  app.useBodyParser('json', {
    limit: MAX_JSON_BODY,
    verify: refuseDeepJson,
  } as NestExpressBodyParserOptionsFor<'json'>);
  const corsOrigins = config.get('CORS_ORIGINS', { infer: true });
  if (corsOrigins) {
    app.enableCors({
      origin: corsOrigins.split(',').map((origin) => origin.trim()),
      credentials: false,
    });
  }
  app.setGlobalPrefix(API_PREFIX);
  app.useGlobalPipes(createValidationPipe());
  app.useGlobalFilters(new ApiExceptionFilter());
  app.enableShutdownHooks();
  const document = SwaggerModule.createDocument(
    app,
    new DocumentBuilder()
      .setTitle('Loftwright API')
      .setDescription('Lift and buoyancy calculations, their versions, review and sign-off.')
      .setVersion(API_VERSION)
      .addBearerAuth()
      .build(),
  );
  SwaggerModule.setup(`${API_PREFIX}/docs`, app, document, {
    jsonDocumentUrl: `${API_PREFIX}/docs-json`,
  });
  serveWebApp(app, config.get('WEB_DIST_DIR', { infer: true }) ?? DEFAULT_WEB_DIST_DIR);
}
