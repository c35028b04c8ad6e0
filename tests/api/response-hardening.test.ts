import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import supertest from 'supertest';
import { afterAll, describe, expect, it } from 'vitest';
import viteConfig from '../../vite.config';
import { signedInAgent, useApiApp } from '../api-app';
import { makeUser } from '../factories';
import { useTestDatabase } from '../setup/database';

// A build folder that still holds a source map (as an old or development build would).
const root = fs.mkdtempSync(path.join(os.tmpdir(), 'crankwise-dist-'));
fs.mkdirSync(path.join(root, 'assets'), { recursive: true });
fs.writeFileSync(path.join(root, 'index.html'), '<!doctype html><title>shell</title>');
fs.writeFileSync(path.join(root, 'assets', 'app-abc123.js'), 'console.log("app")');
fs.writeFileSync(path.join(root, 'assets', 'app-abc123.js.map'), '{"version":3,"sources":["src/secret.ts"]}');
afterAll(() => fs.rmSync(root, { recursive: true, force: true }));

const db = useTestDatabase();
const { app } = useApiApp(db, { CLIENT_DIST: root });

describe('what the API answers carry', () => {
  it('marks signed-in API answers no-store, and leaves routes with their own caching alone', async () => {
    const manager = await signedInAgent(app(), (await makeUser('manager')).email);
    for (const url of ['/api/session', '/api/customers', '/api/visits', '/api/emails']) {
      const res = await manager.get(url);
      expect(res.status, url).toBe(200);
      expect(res.headers['cache-control'], url).toBe('no-store');
    }
    // Errors too: a refusal is not cached either.
    expect((await supertest(app()).get('/api/visits')).headers['cache-control']).toBe('no-store');
    // The public report routes set their own policy.
    expect((await supertest(app()).get(`/api/report/${'A'.repeat(60)}`)).headers['cache-control']).toBe('private, no-store');
    // Client files keep theirs.
    expect((await supertest(app()).get('/assets/app-abc123.js')).headers['cache-control']).toContain('immutable');
  });

  it('says in plain words how large a request may be', async () => {
    const res = await supertest(app()).post('/api/session').set('Content-Type', 'application/json').send(JSON.stringify({ email: 'a@b.example', password: 'x'.repeat(1_100_000) }));
    expect(res.status).toBe(413);
    expect(res.body.error.code).toBe('too_large');
    expect(res.body.error.message).toMatch(/^The request is larger than 1 MB/);
  });

  it('serves no source maps, and a production build makes none', async () => {
    const map = await supertest(app()).get('/assets/app-abc123.js.map');
    expect(map.status).toBe(404);
    expect(map.text).not.toContain('secret.ts');
    const config = typeof viteConfig === 'function' ? await viteConfig({ mode: 'production', command: 'build', isSsrBuild: false, isPreview: false }) : viteConfig;
    expect(config.build?.sourcemap).toBe(false);
  });
});
