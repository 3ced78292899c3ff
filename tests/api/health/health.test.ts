import request from 'supertest';
import { describe, expect, it } from 'vitest';
import { createApp, createSequelize, loadEnv } from '@seamwright/api';
import { testApp } from '../../fixtures/app.js';

describe('GET /api/health', () => {
  it('reports api and database ok when MariaDB answers', async () => {
    const res = await request(testApp().app).get('/api/health').expect(200);
    expect(res.body).toEqual({ data: { status: 'ok', api: 'ok', database: 'ok' } });
  });

  it('answers 503 with database down when the database cannot be reached', async () => {
    const env = loadEnv({ ...process.env, DB_PORT: '1' });
    const sequelize = createSequelize(env.db);
    try {
      const { plannerPool } = testApp();
      const res = await request(createApp({ env, sequelize, plannerPool }))
        .get('/api/health')
        .expect(503);
      expect(res.body.data).toMatchObject({ api: 'ok', database: 'down' });
    } finally {
      await sequelize.close();
    }
  });
});

describe('HTTP conventions', () => {
  it('echoes a well-formed x-request-id and replaces a malformed one', async () => {
    const app = testApp().app;
    const kept = await request(app).get('/api/health').set('x-request-id', 'client-req-12345678');
    expect(kept.headers['x-request-id']).toBe('client-req-12345678');
    const replaced = await request(app)
      .get('/api/health')
      .set('x-request-id', 'bad id with spaces<script>');
    expect(replaced.headers['x-request-id']).toMatch(/^[0-9a-f-]{36}$/);
  });

  it('answers an unknown API route with 404 problem+json carrying the request id', async () => {
    const res = await request(testApp().app).get('/api/no-such-thing').expect(404);
    expect(res.headers['content-type']).toMatch(/^application\/problem\+json/);
    expect(res.body).toMatchObject({ status: 404, code: 'NOT_FOUND', title: expect.any(String) });
    expect(res.body.requestId).toBe(res.headers['x-request-id']);
  });

  it('sends a Content-Security-Policy that forbids inline scripts', async () => {
    const res = await request(testApp().app).get('/api/health');
    const csp = String(res.headers['content-security-policy']);
    expect(csp).toContain("script-src 'self'");
    expect(csp).not.toMatch(/script-src[^;]*unsafe-inline/);
    expect(csp).toContain("img-src 'self' data:");
    expect(res.headers['x-powered-by']).toBeUndefined();
  });
});
