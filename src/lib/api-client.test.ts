/**
 * The client side of the foundation API contract (issue 2, deliver 7 and 8): every failure is
 * `{ error: { code, message, fields? } }` (shared/schemas/api-error.ts) and must reach callers
 * as a typed ApiError carrying status, code, message and the per-field messages.
 */
import { afterEach, describe, expect, it, vi } from 'vitest';
import { z } from 'zod';
import { api, ApiError, buildApiUrl, isApiError, toApiError } from './api-client';

function respond(status: number, body?: unknown) {
  return vi.fn(async (_url: string, _init?: RequestInit) =>
    new Response(body === undefined ? null : JSON.stringify(body), { status, headers: { 'Content-Type': 'application/json' } }),
  );
}

afterEach(() => vi.unstubAllGlobals());

describe('buildApiUrl', () => {
  it('prefixes /api and leaves out filters that are not set', () => {
    expect(buildApiUrl('/users', { page: 2, pageSize: 25, q: '', actor: undefined, entityType: null })).toBe('/api/users?page=2&pageSize=25');
  });

  it('encodes query values', () => {
    expect(buildApiUrl('audit', { actor: 'a+b@larkspur.example' })).toBe('/api/audit?actor=a%2Bb%40larkspur.example');
  });
});

describe('toApiError', () => {
  it('keeps code, message and fields from the contract error body', () => {
    const error = toApiError(409, { error: { code: 'conflict', message: 'exists', fields: { email: 'An account with this e-mail address already exists.' } } });
    expect(error).toBeInstanceOf(ApiError);
    expect(error).toMatchObject({ status: 409, code: 'conflict', message: 'exists', fields: { email: 'An account with this e-mail address already exists.' } });
  });

  it('still gives a readable error when the body is not the contract shape (e.g. a proxy page)', () => {
    const error = toApiError(502, '<html>bad gateway</html>');
    expect(error.status).toBe(502);
    expect(error.code).toBe('server_error');
    expect(error.message).toContain('502');
  });
});

describe('api', () => {
  it('sends JSON with the session cookie and parses the answer with the schema given', async () => {
    const fetchMock = respond(200, { user: { id: 1 } });
    vi.stubGlobal('fetch', fetchMock);
    const body = await api.post('/auth/sign-in', { email: 'a@b.example', password: 'x' }, { schema: z.object({ user: z.object({ id: z.number() }) }) });
    expect(body.user.id).toBe(1);
    const [url, init] = fetchMock.mock.calls[0];
    expect(url).toBe('/api/auth/sign-in');
    expect(init?.method).toBe('POST');
    expect(init?.credentials).toBe('same-origin');
    expect(new Headers(init?.headers).get('Content-Type')).toBe('application/json');
    expect(JSON.parse(String(init?.body))).toEqual({ email: 'a@b.example', password: 'x' });
  });

  it('throws ApiError with the server’s 422 message and fields', async () => {
    vi.stubGlobal('fetch', respond(422, { error: { code: 'unprocessable', message: 'needs an administrator', fields: { role: 'needs an administrator' } } }));
    const failure = await api.patch('/users/1', { role: 'engineer' }).catch((error: unknown) => error);
    expect(isApiError(failure)).toBe(true);
    expect(failure).toMatchObject({ status: 422, code: 'unprocessable', fields: { role: 'needs an administrator' } });
  });

  it('treats 204 No Content as success without a body', async () => {
    vi.stubGlobal('fetch', respond(204));
    await expect(api.post('/auth/sign-out')).resolves.toBeUndefined();
  });

  it('rejects an answer that does not match the schema instead of passing bad data on', async () => {
    vi.stubGlobal('fetch', respond(200, { user: { id: 'not-a-number' } }));
    await expect(api.get('/me', undefined, { schema: z.object({ user: z.object({ id: z.number() }) }) })).rejects.toBeInstanceOf(z.ZodError);
  });

  it('turns a network failure into ApiError status 0', async () => {
    vi.stubGlobal('fetch', vi.fn(async () => Promise.reject(new TypeError('fetch failed'))));
    await expect(api.get('/health')).rejects.toMatchObject({ status: 0, code: 'network_error' });
  });
});
