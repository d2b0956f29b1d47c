import { existsSync } from 'node:fs';
import { join, resolve } from 'node:path';
import { Logger } from '@nestjs/common';
import type { NestExpressApplication } from '@nestjs/platform-express';
import express, { type NextFunction, type Request, type Response } from 'express';
import { API_PREFIX } from '../app.constants';

/** Where the web workspace's `vite build` writes, seen from src/web or dist/web. */
export const DEFAULT_WEB_DIST_DIR = resolve(__dirname, '..', '..', '..', 'web', 'dist');

/**
 * Serves the built web app from `distDir` for every path outside the API: real files as they are
 * (hashed assets cached for a year), and index.html for any other GET so client-side routes
 * survive a reload. API paths are left to Nest, which answers unknown ones with a JSON 404.
 */
export function serveWebApp(app: NestExpressApplication, distDir: string): void {
  const indexFile = join(distDir, 'index.html');
  if (!existsSync(indexFile)) {
    new Logger('WebApp').warn(`No built web app at ${distDir}; run "npm run build" to serve it.`);
  }
  const isApiPath = (request: Request) =>
    request.path === `/${API_PREFIX}` || request.path.startsWith(`/${API_PREFIX}/`);
  const staticFiles = express.static(distDir, {
    index: false,
    setHeaders: (response, filePath) => {
      if (filePath.includes(`${join(distDir, 'assets')}`)) {
        response.setHeader('Cache-Control', 'public, max-age=31536000, immutable');
      }
    },
  });
  // API requests never look on disk: a file lookup waits for one of libuv's few worker threads,
  // which a burst of password hashing may hold (docs/performance.md).
  app.use((request: Request, response: Response, next: NextFunction) =>
    isApiPath(request) ? next() : staticFiles(request, response, next),
  );
  app.use((request: Request, response: Response, next: NextFunction) => {
    if (request.method !== 'GET' || isApiPath(request)) {
      next();
      return;
    }
    if (!existsSync(indexFile)) {
      response.status(404).type('text/plain').send('The web app has not been built.');
      return;
    }
    response.setHeader('Cache-Control', 'no-cache');
    response.sendFile(indexFile);
  });
}
