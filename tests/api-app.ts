import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import type { Express } from 'express';
import supertest from 'supertest';
import { afterAll, beforeAll } from 'vitest';
import { createApp } from '../server/app';
import { loadEnv } from '../server/config/env';
import { TEST_PASSWORD } from './factories';
import type { TestDatabase } from './setup/database';

// The origin each app counts as its own (its PUBLIC_BASE_URL): every helper below sends it, as a
// browser on our own pages does, so state-changing requests pass the same-origin rule.
const origins = new WeakMap<Express, string>();

export function originOf(app: Express): string {
  const origin = origins.get(app);
  if (!origin) throw new Error('app not made by useApiApp');
  return origin;
}

/** An app bound to the file's own test database. */
export function useApiApp(db: TestDatabase, envOverrides: Record<string, string> = {}): { app: () => Express } {
  let app: Express | undefined;
  let close: (() => Promise<void>) | undefined;
  // Uploads go to a folder of this app's own, removed afterwards, unless the test names one.
  let uploadDir: string | undefined;
  beforeAll(() => {
    uploadDir = envOverrides.UPLOAD_DIR ? undefined : fs.mkdtempSync(path.join(os.tmpdir(), 'crankwise-uploads-'));
    const env = loadEnv({ NODE_ENV: 'test', DATABASE_URL: db.url, SESSION_SECRET: 'test-secret-that-is-long-enough', LOG_LEVEL: 'silent', UPLOAD_DIR: uploadDir, ...envOverrides });
    ({ app, close } = createApp({ env, sequelize: db.sequelize }));
    origins.set(app, new URL(env.PUBLIC_BASE_URL).origin);
  });
  afterAll(async () => {
    await close?.();
    if (uploadDir) fs.rmSync(uploadDir, { recursive: true, force: true });
  });
  return {
    app: () => {
      if (!app) throw new Error('app not ready');
      return app;
    },
  };
}

/**
 * A caller with no session that behaves like our client on our own pages: it sends our Origin and
 * declares JSON on every request (a multipart upload replaces the type with its own).
 */
export function anonymous(app: Express) {
  return supertest.agent(app).set('Origin', originOf(app)).set('Content-Type', 'application/json');
}

/** A supertest agent (keeps cookies) signed in as the given user. */
export async function signedInAgent(app: Express, email: string) {
  const agent = anonymous(app);
  const res = await agent.post('/api/session').send({ email, password: TEST_PASSWORD });
  if (res.status !== 200) throw new Error(`sign-in failed for ${email}: ${res.status} ${JSON.stringify(res.body)}`);
  return agent;
}
