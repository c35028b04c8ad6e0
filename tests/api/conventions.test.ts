import express from 'express';
import supertest from 'supertest';
import { describe, expect, it } from 'vitest';
import { errorHandler } from '../../server/lib/errors';
import { anonymous, useApiApp } from '../api-app';
import { useTestDatabase } from '../setup/database';

const db = useTestDatabase();
const { app } = useApiApp(db);

describe('API conventions', () => {
  it('reports the database state on /api/health without sign-in', async () => {
    const res = await supertest(app()).get('/api/health');
    expect(res.status).toBe(200);
    expect(res.body.status).toBe('ok');
    expect(res.body.database.state).toBe('up');
    expect(res.body.database.migrations).toBeGreaterThanOrEqual(1);
  });

  it('answers an unknown API route with 404 JSON', async () => {
    const res = await supertest(app()).get('/api/no-such-thing');
    expect(res.status).toBe(404);
    expect(res.headers['content-type']).toMatch(/json/);
    expect(res.body.error.message).toBe('There is no API route GET /no-such-thing.');
  });

  it('answers a body that is not JSON with 400', async () => {
    const res = await anonymous(app()).post('/api/session').set('Content-Type', 'application/json').send('{oops');
    expect(res.status).toBe(400);
    expect(res.body.error.message).toMatch(/could not be read as JSON/);
  });

  it('sets helmet security headers and a request id', async () => {
    const res = await supertest(app()).get('/api/health');
    expect(res.headers['x-content-type-options']).toBe('nosniff');
    expect(res.headers['content-security-policy']).toContain("default-src 'self'");
    expect(res.headers['x-request-id']).toMatch(/^[0-9a-f-]{36}$/);
    expect(res.headers['x-powered-by']).toBeUndefined();
  });

  it('answers an unexpected error with 500, a reference and no stack trace', async () => {
    const broken = express();
    broken.use((req, _res, next) => {
      (req as { id?: string }).id = 'req-123';
      next();
    });
    broken.get('/boom', () => {
      throw new Error('secret internal detail at /srv/app.ts:42');
    });
    broken.use(errorHandler);
    const res = await supertest(broken).get('/boom');
    expect(res.status).toBe(500);
    expect(res.body.error.message).toMatch(/give this reference to support: req-123/);
    expect(JSON.stringify(res.body)).not.toMatch(/secret internal detail|app\.ts/);
  });
});
