import { afterEach, describe, expect, it, vi } from 'vitest';
import { ApiError, ApiUnreachableError, apiFetch, isApiUnreachable } from './api';
import { safeNextPath } from './navigation';

function answer(status: number, body?: unknown, contentType = 'application/json') {
  return vi.fn(async () =>
    new Response(body === undefined ? null : typeof body === 'string' ? body : JSON.stringify(body), {
      status,
      headers: { 'Content-Type': contentType },
    }),
  );
}

describe('apiFetch', () => {
  afterEach(() => vi.unstubAllGlobals());

  it('sends JSON with same-origin credentials and returns the parsed body', async () => {
    const fetchMock = answer(201, { user: { id: 'u1' } });
    vi.stubGlobal('fetch', fetchMock);
    await expect(apiFetch('/api/auth/signup', { method: 'POST', body: { email: 'a@b.test' } })).resolves.toEqual({ user: { id: 'u1' } });
    const [, init] = fetchMock.mock.calls[0] as unknown as [string, RequestInit];
    expect(init.credentials).toBe('same-origin');
    expect((init.headers as Record<string, string>)['Content-Type']).toBe('application/json');
    expect(init.body).toBe('{"email":"a@b.test"}');
  });

  it('returns undefined for 204 No Content', async () => {
    vi.stubGlobal('fetch', answer(204));
    await expect(apiFetch('/api/auth/logout', { method: 'POST' })).resolves.toBeUndefined();
  });

  it('turns the error envelope into an ApiError with code, message and status', async () => {
    vi.stubGlobal('fetch', answer(401, { error: { code: 'invalid_credentials', message: 'Wrong email or password.' } }));
    const error = await apiFetch('/api/auth/login').catch((e: unknown) => e);
    expect(error).toBeInstanceOf(ApiError);
    expect(error).toMatchObject({ status: 401, code: 'invalid_credentials', message: 'Wrong email or password.' });
    expect(isApiUnreachable(error)).toBe(false);
  });

  it('calls a network failure "unreachable"', async () => {
    vi.stubGlobal('fetch', vi.fn(async () => Promise.reject(new TypeError('Failed to fetch'))));
    await expect(apiFetch('/api/workspaces')).rejects.toBeInstanceOf(ApiUnreachableError);
  });

  it.each([502, 503, 504])('calls a %i gateway answer "unreachable"', async (status) => {
    vi.stubGlobal('fetch', answer(status, '<html>Bad gateway</html>', 'text/html'));
    await expect(apiFetch('/api/workspaces')).rejects.toBeInstanceOf(ApiUnreachableError);
  });

  it('keeps a structured 500 from the server as an ordinary ApiError', async () => {
    vi.stubGlobal('fetch', answer(500, { error: { code: 'internal', message: 'Something broke.' } }));
    const error = await apiFetch('/api/workspaces').catch((e: unknown) => e);
    expect(isApiUnreachable(error)).toBe(false);
    expect(error).toMatchObject({ code: 'internal', status: 500 });
  });
});

describe('safeNextPath', () => {
  it('accepts an in-app path with its query', () => {
    expect(safeNextPath('/w/abc/members?x=1')).toBe('/w/abc/members?x=1');
  });
  it.each(['https://elsewhere.test/', '//elsewhere.test', '/\\elsewhere.test', '', null, '/sign-in?next=/x'])(
    'falls back to /workspaces for %s',
    (next) => {
      expect(safeNextPath(next)).toBe('/workspaces');
    },
  );
});
