import { mkdirSync, mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import Database from 'better-sqlite3';
import request from 'supertest';
import { DataSource } from 'typeorm';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createTestApp, type TestApp } from './support/create-test-app';

const apiManifest = JSON.parse(readFileSync(join(__dirname, '..', 'package.json'), 'utf8')) as {
  version: string;
};

// Well over compression's 1 kB threshold, and as repetitive as minified code.
const BIG_ASSET =
  'export const rows = [' + '{"altitudeM":1000,"pressurePa":89876},'.repeat(400) + '];';

describe('GET /api/health', () => {
  let testApp: TestApp;
  let webDistDir: string;

  beforeAll(async () => {
    webDistDir = mkdtempSync(join(tmpdir(), 'loftwright-web-dist-'));
    mkdirSync(join(webDistDir, 'assets'));
    writeFileSync(join(webDistDir, 'index.html'), '<!doctype html><title>web app fixture</title>');
    writeFileSync(join(webDistDir, 'assets', 'app-1234.js'), 'console.info("asset fixture");');
    writeFileSync(join(webDistDir, 'assets', 'big-5678.js'), BIG_ASSET);
    testApp = await createTestApp({ webDistDir });
  });

  afterAll(async () => {
    await testApp.close();
    rmSync(webDistDir, { recursive: true, force: true });
  });

  it('answers 200 with the versions and a working, fully migrated database', async () => {
    const response = await request(testApp.app.getHttpServer()).get('/api/health').expect(200);
    expect(response.body).toMatchObject({
      status: 'ok',
      database: 'ok',
      version: apiManifest.version,
      pendingMigrations: false,
    });
    expect(response.body.engineVersion).toMatch(/^\d+\.\d+\.\d+$/);
    expect(Number.isNaN(Date.parse(response.body.databaseCreatedAt))).toBe(false);
  });

  it('created the SQLite file under DATA_DIR and recorded the migration there', () => {
    const db = new Database(join(testApp.dataDir, 'loftwright.sqlite'), { readonly: true });
    try {
      const migrations = db.prepare('SELECT name FROM migrations').all() as { name: string }[];
      expect(migrations.map((row) => row.name)).toContain('InitSchema1764633600000');
      const installation = db.prepare('SELECT id FROM installation').all();
      expect(installation).toEqual([{ id: 1 }]);
    } finally {
      db.close();
    }
  });

  it('sends security headers', async () => {
    const response = await request(testApp.app.getHttpServer()).get('/api/health');
    expect(response.headers['x-content-type-options']).toBe('nosniff');
    expect(response.headers['content-security-policy']).toContain("default-src 'self'");
  });

  describe('beside the API', () => {
    it('answers an unknown API path with a JSON 404, not the web app', async () => {
      const response = await request(testApp.app.getHttpServer()).get('/api/no-such-thing');
      expect(response.status).toBe(404);
      expect(response.headers['content-type']).toMatch(/application\/json/);
    });

    it('serves index.html for a client-side route, so a reload works', async () => {
      const response = await request(testApp.app.getHttpServer()).get('/calculations/42');
      expect(response.status).toBe(200);
      expect(response.text).toContain('web app fixture');
    });

    it('serves built assets with a long cache lifetime', async () => {
      const response = await request(testApp.app.getHttpServer()).get('/assets/app-1234.js');
      expect(response.status).toBe(200);
      expect(response.text).toContain('asset fixture');
      expect(response.headers['cache-control']).toContain('immutable');
    });

    it('sends assets gzip-compressed to a browser that accepts it', async () => {
      const response = await request(testApp.app.getHttpServer())
        .get('/assets/big-5678.js')
        .set('Accept-Encoding', 'gzip');
      expect(response.status).toBe(200);
      expect(response.headers['content-encoding']).toBe('gzip');
      // supertest inflates the body: what arrives is the file, byte for byte.
      expect(response.text).toBe(BIG_ASSET);
    });

    it('sends assets as they are to a client that does not accept gzip', async () => {
      const response = await request(testApp.app.getHttpServer())
        .get('/assets/big-5678.js')
        .set('Accept-Encoding', 'identity');
      expect(response.headers['content-encoding']).toBeUndefined();
      expect(Number(response.headers['content-length'])).toBe(BIG_ASSET.length);
    });
  });

  // Runs last: it closes the connection the other cases use.
  it('answers 503 with database "error" once the database is gone', async () => {
    await testApp.app.get(DataSource).destroy();
    const response = await request(testApp.app.getHttpServer()).get('/api/health').expect(503);
    expect(response.body).toMatchObject({ status: 'error', database: 'error' });
  });
});
