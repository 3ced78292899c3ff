// The response headers docs/SECURITY.md relies on (ASVS V8.2, V14.4, V14.5): a CSP with no
// inline scripts and no framing, nosniff, no referrer, no caching of API answers, HSTS on
// https, and no CORS grant to another origin.
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import request from 'supertest';
import { afterAll, describe, expect, it } from 'vitest';
import { createApp, createSequelize, loadEnv } from '@seamwright/api';
import { testApp } from '../../fixtures/app.js';
import { signUpCompany } from '../../fixtures/factories.js';
import { testEnvVars } from '../../fixtures/test-env.js';

function directives(csp: string): Map<string, string[]> {
  return new Map(
    csp
      .split(';')
      .map((d) => d.trim().split(/\s+/))
      .filter((parts) => parts[0])
      .map(([name, ...values]) => [name!, values]),
  );
}

describe('security headers', () => {
  it("sends a CSP without 'unsafe-inline' or 'unsafe-eval' for scripts, and forbids framing and plugins", async () => {
    const res = await request(testApp().app).get('/api/health');
    const csp = directives(String(res.headers['content-security-policy']));
    for (const name of ['script-src', 'default-src']) {
      expect(csp.get(name), name).toEqual(["'self'"]);
    }
    expect(csp.get('script-src-attr')).toEqual(["'none'"]);
    expect(csp.get('object-src')).toEqual(["'none'"]);
    expect(csp.get('frame-ancestors')).toEqual(["'none'"]);
    expect(csp.get('base-uri')).toEqual(["'self'"]);
    expect(res.headers['x-content-type-options']).toBe('nosniff');
    expect(res.headers['referrer-policy']).toBe('no-referrer');
    expect(res.headers['x-frame-options']).toBe('SAMEORIGIN');
  });

  it('tells browsers and proxies not to store API answers', async () => {
    const { client } = await signUpCompany(testApp().app);
    for (const path of ['/api/me', '/api/customers', '/api/health', '/api/no-such-route']) {
      const res = await client.get(path);
      expect(res.headers['cache-control'], path).toMatch(/no-store/);
    }
  });

  it('grants no other origin cross-origin access (no CORS headers)', async () => {
    const res = await request(testApp().app)
      .options('/api/customers')
      .set('Origin', 'https://elsewhere.example')
      .set('Access-Control-Request-Method', 'POST');
    expect(res.headers['access-control-allow-origin']).toBeUndefined();
    expect(res.headers['access-control-allow-credentials']).toBeUndefined();
  });

  describe('on https', () => {
    const env = loadEnv({
      ...testEnvVars,
      NODE_ENV: 'production',
      APP_URL: 'https://turf.example.test',
      TRUST_PROXY: '1',
      // Production insists on a folder for uploads; this app never stores one.
      UPLOADS_DIR: join(tmpdir(), 'seamwright-security-headers-uploads'),
    });
    const sequelize = createSequelize(env.db);
    const app = createApp({ env, sequelize, plannerPool: testApp().plannerPool });

    afterAll(async () => {
      await sequelize.close();
    });

    it('sends Strict-Transport-Security', async () => {
      const res = await request(app).get('/api/health');
      expect(res.headers['strict-transport-security']).toMatch(/max-age=\d{7,}/);
    });
  });
});
