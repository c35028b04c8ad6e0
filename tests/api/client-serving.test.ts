import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import supertest from 'supertest';
import { describe, expect, it } from 'vitest';
import { useApiApp } from '../api-app';
import { useTestDatabase } from '../setup/database';

// Under a dot folder, as a build kept in .data/ would be.
const dist = path.join(fs.mkdtempSync(path.join(os.tmpdir(), 'crankwise-dist-')), '.build');
fs.mkdirSync(path.join(dist, 'assets'), { recursive: true });
fs.writeFileSync(path.join(dist, 'index.html'), '<!doctype html><title>Crankwise test shell</title>');
fs.writeFileSync(path.join(dist, 'assets', 'app-abc123.js'), 'console.log("app")');

const db = useTestDatabase();
// A relative folder, as `npm start` passes it.
const { app } = useApiApp(db, { CLIENT_DIST: path.relative(process.cwd(), dist) });

describe('serving the built client', () => {
  it('answers a page path with the app shell, uncached', async () => {
    const res = await supertest(app()).get('/visits/42');
    expect(res.status).toBe(200);
    expect(res.text).toContain('Crankwise test shell');
    expect(res.headers['cache-control']).toBe('no-cache');
  });

  it('serves hashed assets as immutable', async () => {
    const res = await supertest(app()).get('/assets/app-abc123.js');
    expect(res.status).toBe(200);
    expect(res.headers['cache-control']).toContain('immutable');
  });

  it('answers a missing file with 404 instead of the app shell', async () => {
    expect((await supertest(app()).get('/favicon.ico')).status).toBe(404);
    expect((await supertest(app()).get('/assets/missing.js')).status).toBe(404);
  });

  it('keeps unknown API routes as JSON 404s', async () => {
    const res = await supertest(app()).get('/api/nothing-here');
    expect(res.status).toBe(404);
    expect(res.body.error.code).toBe('not_found');
  });
});
