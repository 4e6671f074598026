import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { z } from 'zod';
import { api, ApiError, apiRequest, CSRF_HEADER, forgetCsrfToken, isApiError, withQuery } from '@/lib/api';

// The behaviour under test is Grovewalk's own API contract (client brief: CSRF token from
// GET /api/auth/csrf, sent as x-csrf-token on every change, refreshed after sign-in/out and retried
// once on 403 "csrf_invalid"; errors as { error: { code, message, fields? } }). The pattern itself is
// the synchronizer token sent in a custom request header (OWASP CSRF Prevention Cheat Sheet).

interface Call {
  url: string;
  method: string;
  headers: Record<string, string>;
  body: string | undefined;
  credentials: RequestCredentials | undefined;
}

function json(status: number, body: unknown, headers: Record<string, string> = {}): Response {
  return new Response(JSON.stringify(body), { status, headers: { 'content-type': 'application/json', ...headers } });
}

/** A fake server: hands out numbered CSRF tokens and answers other paths with `handler`. */
function fakeServer(handler: (call: Call, tokenNow: string) => Response | Promise<Response>) {
  const calls: Call[] = [];
  let issued = 0;
  const fetchMock = vi.fn(async (input: RequestInfo | URL, init?: RequestInit) => {
    const call: Call = {
      url: String(input),
      method: init?.method ?? 'GET',
      headers: Object.fromEntries(new Headers(init?.headers).entries()),
      body: typeof init?.body === 'string' ? init.body : undefined,
      credentials: init?.credentials,
    };
    calls.push(call);
    if (call.url === '/api/auth/csrf') {
      issued += 1;
      return json(200, { token: `token-${issued}` });
    }
    return handler(call, `token-${issued}`);
  });
  vi.stubGlobal('fetch', fetchMock);
  return { calls, csrfCalls: () => calls.filter((c) => c.url === '/api/auth/csrf').length };
}

beforeEach(() => forgetCsrfToken());
afterEach(() => vi.unstubAllGlobals());

describe('api client: CSRF token handling (contract: client brief)', () => {
  it('sends reads without a token and without fetching one', async () => {
    const server = fakeServer(() => json(200, { club: null }));
    await api.get('/api/club');
    expect(server.csrfCalls()).toBe(0);
    expect(server.calls[0]!.headers[CSRF_HEADER]).toBeUndefined();
    expect(server.calls[0]!.credentials).toBe('same-origin');
  });

  it('fetches the token once and sends it on every change (POST, PATCH, PUT, DELETE)', async () => {
    const server = fakeServer(() => json(200, { ok: true }));
    await api.post('/api/a', { x: 1 });
    await api.patch('/api/b', { y: 2 });
    await api.put('/api/c', { z: 3 });
    await api.delete('/api/d');
    expect(server.csrfCalls()).toBe(1);
    const changes = server.calls.filter((c) => c.url !== '/api/auth/csrf');
    expect(changes.map((c) => c.method)).toEqual(['POST', 'PATCH', 'PUT', 'DELETE']);
    expect(changes.every((c) => c.headers[CSRF_HEADER] === 'token-1')).toBe(true);
    expect(changes[0]!.headers['content-type']).toBe('application/json');
    expect(changes[0]!.body).toBe('{"x":1}');
  });

  it('shares one token request between changes sent at the same moment', async () => {
    const server = fakeServer(() => json(200, { ok: true }));
    await Promise.all([api.post('/api/a', {}), api.post('/api/b', {}), api.post('/api/c', {})]);
    expect(server.csrfCalls()).toBe(1);
  });

  it('refetches the token after a call that changes the session', async () => {
    const server = fakeServer(() => json(200, { ok: true }));
    await api.post('/api/auth/sign-in', {}, { sessionChange: true });
    await api.post('/api/a', {});
    const sent = server.calls.filter((c) => c.url === '/api/a');
    expect(server.csrfCalls()).toBe(2);
    expect(sent[0]!.headers[CSRF_HEADER]).toBe('token-2');
  });

  it('on 403 csrf_invalid, fetches a new token and retries exactly once', async () => {
    let attempts = 0;
    const server = fakeServer((call) => {
      attempts += 1;
      if (call.headers[CSRF_HEADER] === 'token-1') return json(403, { error: { code: 'csrf_invalid', message: 'Stale token.' } });
      return json(200, { ok: true });
    });
    await expect(api.post('/api/a', {})).resolves.toEqual({ ok: true });
    expect(attempts).toBe(2);
    expect(server.csrfCalls()).toBe(2);
  });

  it('gives up after the single retry when the token is refused again', async () => {
    let attempts = 0;
    fakeServer(() => {
      attempts += 1;
      return json(403, { error: { code: 'csrf_invalid', message: 'Stale token.' } });
    });
    const error = await api.post('/api/a', {}).catch((e: unknown) => e);
    expect(isApiError(error, 'csrf_invalid')).toBe(true);
    expect(attempts).toBe(2);
  });

  it('does not retry other 403 answers', async () => {
    let attempts = 0;
    fakeServer(() => {
      attempts += 1;
      return json(403, { error: { code: 'email_unverified', message: 'Confirm your e-mail first.' } });
    });
    await expect(api.post('/api/auth/sign-in', {})).rejects.toMatchObject({ status: 403, code: 'email_unverified' });
    expect(attempts).toBe(1);
  });

  it('does not keep a failed token request: the next change asks again', async () => {
    let csrfTries = 0;
    vi.stubGlobal(
      'fetch',
      vi.fn(async (input: RequestInfo | URL) => {
        if (String(input) === '/api/auth/csrf') {
          csrfTries += 1;
          return csrfTries === 1 ? new Response('down', { status: 503 }) : json(200, { token: 'fresh' });
        }
        return json(200, { ok: true });
      }),
    );
    await expect(api.post('/api/a', {})).rejects.toMatchObject({ status: 503, code: 'server_error' });
    await expect(api.post('/api/a', {})).resolves.toEqual({ ok: true });
    expect(csrfTries).toBe(2);
  });
});

describe('api client: errors and responses', () => {
  it('parses the error body into status, code, message and fields', async () => {
    fakeServer(() =>
      json(400, { error: { code: 'bad_credentials', message: 'That password is not right.', fields: { currentPassword: 'Not right.' } } }),
    );
    const error = await api.post('/api/auth/change-password', {}).catch((e: unknown) => e);
    expect(error).toBeInstanceOf(ApiError);
    expect(error).toMatchObject({ status: 400, code: 'bad_credentials', message: 'That password is not right.' });
    expect((error as ApiError).fields).toEqual({ currentPassword: 'Not right.' });
  });

  // RFC 9110 §10.2.3: Retry-After is either delay-seconds or an HTTP-date.
  it('reads Retry-After given in seconds (RFC 9110 §10.2.3)', async () => {
    fakeServer(() => json(429, { error: { code: 'rate_limited', message: 'Too many tries.' } }, { 'retry-after': '120' }));
    const error = (await api.post('/api/auth/sign-in', {}).catch((e: unknown) => e)) as ApiError;
    expect(error.code).toBe('rate_limited');
    expect(error.retryAfterSeconds).toBe(120);
  });

  it('reads Retry-After given as an HTTP-date (RFC 9110 §10.2.3)', async () => {
    const at = new Date(Date.now() + 90_000).toUTCString();
    fakeServer(() => json(429, { error: { code: 'rate_limited', message: 'Too many tries.' } }, { 'retry-after': at }));
    const error = (await api.post('/api/auth/sign-in', {}).catch((e: unknown) => e)) as ApiError;
    // HTTP-dates have whole seconds, so the wait is 89 or 90 s depending on the current millisecond.
    expect(error.retryAfterSeconds).toBeGreaterThanOrEqual(88);
    expect(error.retryAfterSeconds).toBeLessThanOrEqual(90);
  });

  it('turns a non-JSON server fault into a readable server_error', async () => {
    fakeServer(() => new Response('<html>Bad gateway</html>', { status: 502 }));
    await expect(api.get('/api/club')).rejects.toMatchObject({ status: 502, code: 'server_error' });
  });

  it('reports a failed connection as code "network"', async () => {
    vi.stubGlobal('fetch', vi.fn(async () => Promise.reject(new TypeError('fetch failed'))));
    await expect(api.get('/api/club')).rejects.toMatchObject({ status: 0, code: 'network' });
  });

  it('passes an abort through untouched, so cancelled queries stay silent', async () => {
    const controller = new AbortController();
    vi.stubGlobal(
      'fetch',
      vi.fn(async () => {
        controller.abort();
        throw new DOMException('aborted', 'AbortError');
      }),
    );
    const error = await api.get('/api/club', { signal: controller.signal }).catch((e: unknown) => e);
    expect(error).toBeInstanceOf(DOMException);
  });

  it('checks the body against the given schema and rejects a mismatch as bad_response', async () => {
    fakeServer(() => json(200, { user: { id: 'not-a-number' } }));
    const schema = z.object({ user: z.object({ id: z.number() }) });
    await expect(apiRequest('/api/auth/me', { schema })).rejects.toMatchObject({ code: 'bad_response' });
  });

  it('returns undefined for 204 No Content', async () => {
    fakeServer(() => new Response(null, { status: 204 }));
    await expect(api.post('/api/auth/sign-out')).resolves.toBeUndefined();
  });
});

describe('withQuery', () => {
  it('leaves out empty values and encodes the rest (WHATWG URLSearchParams rules)', () => {
    expect(withQuery('/api/admin/users', { q: 'ann & co', role: undefined, page: 2, to: '', x: null })).toBe(
      '/api/admin/users?q=ann+%26+co&page=2',
    );
    expect(withQuery('/api/club', {})).toBe('/api/club');
  });
});
