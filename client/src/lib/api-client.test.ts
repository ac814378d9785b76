import { http, HttpResponse } from 'msw';
import { describe, expect, it } from 'vitest';
import { server } from '@/testing/mocks/server';
import { api, ApiError } from './api-client';

describe('apiRequest', () => {
  it('sends JSON with the session cookie and returns the parsed body', async () => {
    let seen: { credentials: string; contentType: string | null; body: unknown } | null = null;
    server.use(
      http.post('/api/echo', async ({ request }) => {
        seen = {
          credentials: request.credentials,
          contentType: request.headers.get('content-type'),
          body: await request.json(),
        };
        return HttpResponse.json({ ok: true });
      }),
    );
    await expect(api.post('/echo', { a: 1 })).resolves.toEqual({ ok: true });
    expect(seen).toEqual({ credentials: 'include', contentType: 'application/json', body: { a: 1 } });
  });

  it('returns undefined for 204 No Content', async () => {
    server.use(http.post('/api/nothing', () => new HttpResponse(null, { status: 204 })));
    await expect(api.post('/nothing')).resolves.toBeUndefined();
  });

  it('turns the API error shape into an ApiError with its status, message and field errors', async () => {
    server.use(
      http.patch('/api/thing', () =>
        HttpResponse.json(
          { statusCode: 400, message: 'Check the fields', errors: [{ path: 'massG', message: 'Must be positive' }] },
          { status: 400 },
        ),
      ),
    );
    const error = await api.patch('/thing', {}).catch((e: unknown) => e);
    expect(error).toBeInstanceOf(ApiError);
    expect(error).toMatchObject({
      statusCode: 400,
      message: 'Check the fields',
      errors: [{ path: 'massG', message: 'Must be positive' }],
    });
  });

  it('keeps the status of an answer that is not JSON (a proxy error page)', async () => {
    server.use(http.get('/api/broken', () => new HttpResponse('<html>Bad gateway</html>', { status: 502 })));
    const error = await api.get('/broken').catch((e: unknown) => e);
    expect(error).toMatchObject({ statusCode: 502, errors: [] });
    expect((error as ApiError).message).toMatch(/server had a problem/i);
  });

  it('reports a network failure as status 0', async () => {
    server.use(http.get('/api/offline', () => HttpResponse.error()));
    await expect(api.get('/offline')).rejects.toMatchObject({ statusCode: 0 });
  });

  it('reads Retry-After as seconds, so a busy server can say when to try again', async () => {
    server.use(
      http.post('/api/busy', () =>
        HttpResponse.json(
          { statusCode: 503, message: 'Busy', errors: [] },
          { status: 503, headers: { 'Retry-After': '12' } },
        ),
      ),
    );
    await expect(api.post('/busy')).rejects.toMatchObject({ statusCode: 503, retryAfterS: 12 });
  });

  it('has no wait when the server names none', async () => {
    server.use(
      http.get('/api/gone', () => HttpResponse.json({ statusCode: 404, message: 'No', errors: [] }, { status: 404 })),
    );
    await expect(api.get('/gone')).rejects.toMatchObject({ statusCode: 404, retryAfterS: null });
  });
});
