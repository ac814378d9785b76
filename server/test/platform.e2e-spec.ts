import { mkdirSync, mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { type TestApp, startTestApp } from './support/test-app';

describe('health, docs and errors', () => {
  let t: TestApp;

  beforeAll(async () => {
    t = await startTestApp();
  });

  afterAll(async () => {
    await t.close();
  });

  it('reports ok with the database up, without a session', async () => {
    const response = await t.http().get('/api/health').expect(200);
    expect(response.body).toEqual({ status: 'ok', database: 'up', version: expect.stringMatching(/^\d+\.\d+\.\d+/) });
  });

  it('serves the OpenAPI JSON with the auth paths and the zod constraints', async () => {
    const response = await t.http().get('/api/docs-json').expect(200);
    const doc = response.body as {
      openapi: string;
      paths: Record<
        string,
        Record<string, { requestBody?: { content: Record<string, { schema: { $ref?: string } }> } }>
      >;
      components: { schemas: Record<string, { properties?: Record<string, { minLength?: number; format?: string }> }> };
    };
    expect(doc.openapi).toMatch(/^3\./);
    for (const path of ['/api/auth/sign-up', '/api/auth/sign-in', '/api/auth/sign-out', '/api/auth/me']) {
      expect(Object.keys(doc.paths)).toContain(path);
    }
    expect(Object.keys(doc.paths)).toEqual(
      expect.arrayContaining(['/api/admin/accounts', '/api/admin/accounts/{id}', '/api/health']),
    );
    const ref = doc.paths['/api/auth/sign-up']?.post?.requestBody?.content['application/json']?.schema.$ref ?? '';
    const schema = doc.components.schemas[ref.split('/').pop() ?? ''];
    expect(schema?.properties?.password?.minLength).toBe(10);

    const me = (doc.paths['/api/auth/me']?.get ?? {}) as {
      security?: Record<string, unknown>[];
      responses?: Record<string, { content?: Record<string, { schema: { $ref?: string } }> }>;
    };
    expect(me.security).toEqual(expect.arrayContaining([{ cookie: [] }, { bearer: [] }]));
    const errorRef = me.responses?.['401']?.content?.['application/json']?.schema.$ref ?? '';
    const errorSchema = doc.components.schemas[errorRef.split('/').pop() ?? ''] as { required?: string[] } | undefined;
    expect(errorSchema?.required).toEqual(['statusCode', 'message', 'errors']);
  });

  it('serves Swagger UI with its assets from this server, not a CDN', async () => {
    const page = await t.http().get('/api/docs').redirects(1).expect(200);
    expect(page.text).toContain('swagger-ui');
    expect(page.text).not.toMatch(/https?:\/\/(?!localhost)[^"']*\.(js|css)/);
    const scripts = [...page.text.matchAll(/src="([^"]+\.js)"/g)].map((m) => m[1] ?? '');
    expect(scripts.length).toBeGreaterThan(0);
    for (const src of scripts) {
      const url = src.startsWith('/') ? src : `/api/docs/${src.replace(/^\.\//, '')}`;
      await t.http().get(url).expect(200);
    }
  });

  it('sends security headers, with a same-origin content security policy', async () => {
    const response = await t.http().get('/api/health').expect(200);
    expect(response.headers['x-content-type-options']).toBe('nosniff');
    expect(response.headers['x-powered-by']).toBeUndefined();
    const csp = String(response.headers['content-security-policy']);
    expect(csp).toContain("default-src 'self'");
    expect(csp).toContain("script-src 'self'");
    expect(csp).not.toContain('upgrade-insecure-requests');
  });

  it('answers an unknown API path with 404 in the error shape, even without a session', async () => {
    const response = await t.http().get('/api/no-such-thing').expect(404);
    expect(response.body).toEqual({ statusCode: 404, message: 'Cannot GET /api/no-such-thing', errors: [] });
    await t.http().delete('/api/auth/me').expect(404);
  });

  it('answers malformed JSON with 400 in the error shape', async () => {
    const response = await t
      .http()
      .post('/api/auth/sign-in')
      .set('Content-Type', 'application/json')
      .send('{"email": ')
      .expect(400);
    expect(response.body).toEqual({ statusCode: 400, message: 'The request body is not valid JSON', errors: [] });
  });

  it('answers a body over the limit with 413 in the error shape', async () => {
    const response = await t
      .http()
      .post('/api/auth/sign-in')
      .send({ email: 'a@example.test', password: 'x'.repeat(200_000) })
      .expect(413);
    expect(response.body).toEqual({ statusCode: 413, message: 'The request body is too large', errors: [] });
  });
});

describe('health with the database down', () => {
  it('answers 503 with status degraded', async () => {
    const t = await startTestApp();
    try {
      const client = (t.db as unknown as { $client: { close(): Promise<void> } }).$client;
      await client.close();
      const response = await t.http().get('/api/health').expect(503);
      expect(response.body).toEqual({ status: 'degraded', database: 'down', version: expect.any(String) });
    } finally {
      await t.app.close();
    }
  });
});

describe('the built client', () => {
  let t: TestApp;
  let distDir: string;

  beforeAll(async () => {
    distDir = mkdtempSync(join(tmpdir(), 'gramwatt-client-'));
    mkdirSync(join(distDir, 'assets'));
    writeFileSync(
      join(distDir, 'index.html'),
      '<!doctype html><title>Gramwatt test shell</title><div id="root"></div>',
    );
    writeFileSync(join(distDir, 'assets', 'main-abc123.js'), 'console.log("gramwatt");');
    t = await startTestApp({ serveClient: true, env: { CLIENT_DIST_DIR: distDir } });
  });

  afterAll(async () => {
    await t.close();
    rmSync(distDir, { recursive: true, force: true });
  });

  it('serves index.html at / and for any client route (SPA fallback)', async () => {
    for (const path of ['/', '/trips/42/plan', '/admin']) {
      const response = await t.http().get(path).expect(200);
      expect(response.text).toContain('Gramwatt test shell');
      expect(response.headers['cache-control']).toBe('no-cache');
    }
  });

  it('serves hashed assets with a long cache', async () => {
    const response = await t.http().get('/assets/main-abc123.js').expect(200);
    expect(response.text).toContain('gramwatt');
    expect(response.headers['cache-control']).toContain('immutable');
  });

  it('leaves /api to the API', async () => {
    await t.http().get('/api/health').expect(200);
    const response = await t.http().get('/api/nothing-here').expect(404);
    expect(response.body.statusCode).toBe(404);
    await t.http().get('/api').expect(404);
  });

  it('skips static serving when the client is not built', async () => {
    const bare = await startTestApp({ serveClient: true, env: { CLIENT_DIST_DIR: join(distDir, 'missing') } });
    try {
      const response = await bare.http().get('/').expect(404);
      expect(response.body).toEqual({ statusCode: 404, message: 'Cannot GET /', errors: [] });
    } finally {
      await bare.close();
    }
  });
});
