import 'reflect-metadata';
import { Logger } from '@nestjs/common';
import { ConfigService } from '@nestjs/config';
import { NestFactory } from '@nestjs/core';
import type { NestExpressApplication } from '@nestjs/platform-express';
import type { Server } from 'node:http';
import type { AddressInfo } from 'node:net';
import { AppModule } from './app.module';
import { configureApp } from './app.setup';
import type { EnvironmentVariables } from './config/env.validation';
import { describeDatabase } from './database/database.options';

async function bootstrap(): Promise<void> {
  const app = await NestFactory.create<NestExpressApplication>(AppModule);
  configureApp(app);
  const config = app.get<ConfigService<EnvironmentVariables, true>>(ConfigService);
  const host = config.get('HOST', { infer: true });
  const server = app.getHttpServer() as Server;
  // Idle keep-alive connections stay open longer than clients and proxies keep theirs (60 s is the
  // usual proxy default): with Node's 5 s, a client reusing a connection just as the server drops
  // it gets a reset instead of an answer, which a busy machine makes likely.
  server.keepAliveTimeout = 65_000;
  server.headersTimeout = 66_000;
  await app.listen(config.get('PORT', { infer: true }), host);
  const { port } = app.getHttpServer().address() as AddressInfo;
  const shownHost = host === '0.0.0.0' || host === '127.0.0.1' ? 'localhost' : host;
  const databaseFile = describeDatabase(config.get('DATA_DIR', { infer: true }));
  const logger = new Logger('Loftwright');
  logger.log(`Listening on http://${shownHost}:${port} (API under /api)`);
  logger.log(`Database: ${databaseFile}`);
}

void bootstrap();
