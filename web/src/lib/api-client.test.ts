import { afterEach, describe, expect, it, vi } from 'vitest';
import { clearSessionEnd, sessionEndReason } from './session-end';
import {
  ApiError,
  apiRequest,
  parseErrorBody,
  setUnauthenticatedHandler,
  shouldRedirectOn401,
  shouldRetry,
  unwrapData,
  unwrapWithAbilities,
} from './api-client';

describe('parseErrorBody', () => {
  it('keeps the code, message, fields and request id the API sends', () => {
    const error = parseErrorBody(400, {
      error: {
        code: 'validation_failed',
        message: 'Check the form',
        fields: {
          'event.date': 'Event date is required',
          heightCm: 'Height must be at least 120 cm',
          bad: 3,
        },
        requestId: 'req-1',
      },
    });
    expect(error).toBeInstanceOf(ApiError);
    expect(error).toMatchObject({
      status: 400,
      code: 'validation_failed',
      message: 'Check the form',
      requestId: 'req-1',
    });
    expect(error.fields).toEqual({
      'event.date': 'Event date is required',
      heightCm: 'Height must be at least 120 cm',
    });
  });

  it('keeps the warnings of a guardrails_unacknowledged body as sent, and only for that code', () => {
    const warnings = [{ key: 'sodium_low:type:rest', severity: 'warning' }, 'not a warning'];
    const body = (code: string, extra: Record<string, unknown>) => ({
      error: { code, message: 'x', ...extra },
    });
    expect(parseErrorBody(409, body('guardrails_unacknowledged', { warnings })).warnings).toEqual(warnings);
    // Tolerant of its absence (an older server) and of a value that is not a list.
    expect(parseErrorBody(409, body('guardrails_unacknowledged', {})).warnings).toEqual([]);
    expect(parseErrorBody(409, body('guardrails_unacknowledged', { warnings: {} })).warnings).toEqual([]);
    expect(parseErrorBody(409, body('conflict', { warnings })).warnings).toEqual([]);
  });

  it('passes the sign-in message through unchanged', () => {
    const error = parseErrorBody(401, {
      error: { code: 'invalid_credentials', message: 'E-mail or password is incorrect.' },
    });
    expect(error.code).toBe('invalid_credentials');
    expect(error.message).toBe('E-mail or password is incorrect.');
  });

  it('falls back to a plain message when the body is not the error shape', () => {
    expect(parseErrorBody(502, undefined)).toMatchObject({ status: 502, code: 'internal_error' });
    expect(parseErrorBody(429, '<html>')).toMatchObject({ code: 'rate_limited' });
    expect(parseErrorBody(410, { error: 'gone' })).toMatchObject({ code: 'token_invalid' });
    expect(parseErrorBody(404, { error: { code: 'not_found', message: '' } }).message).toBe(
      'We could not find that.',
    );
  });
});

describe('envelopes', () => {
  it('unwraps data and keeps only boolean abilities', () => {
    expect(unwrapData({ data: [1, 2] })).toEqual([1, 2]);
    expect(unwrapData({ status: 'ok' })).toEqual({ status: 'ok' });
    expect(unwrapWithAbilities({ data: { id: 'a' }, abilities: { update: true, delete: 'yes' } })).toEqual({
      data: { id: 'a' },
      abilities: { update: true, delete: false },
    });
  });
});

describe('retry and 401 rules', () => {
  it('never retries a 4xx, retries other failures at most twice', () => {
    expect(shouldRetry(0, new ApiError({ status: 404, code: 'not_found', message: '' }))).toBe(false);
    expect(shouldRetry(0, new ApiError({ status: 429, code: 'rate_limited', message: '' }))).toBe(false);
    expect(shouldRetry(0, new ApiError({ status: 503, code: 'db_unavailable', message: '' }))).toBe(true);
    expect(shouldRetry(2, new ApiError({ status: 0, code: 'network_error', message: '' }))).toBe(false);
  });

  it('treats a 401 from /api/me and sign-in as an answer, elsewhere as a lost session', () => {
    expect(shouldRedirectOn401('/api/me')).toBe(false);
    expect(shouldRedirectOn401('/api/auth/sign-in')).toBe(false);
    expect(shouldRedirectOn401('/api/roster')).toBe(true);
    expect(shouldRedirectOn401('/api/me/settings')).toBe(true);
  });
});

describe('apiRequest with a stubbed fetch', () => {
  afterEach(() => {
    vi.unstubAllGlobals();
  });

  function stub(status: number, body: unknown) {
    const fetchMock = vi.fn(
      async () => new Response(body === undefined ? null : JSON.stringify(body), { status }),
    );
    vi.stubGlobal('fetch', fetchMock);
    vi.stubGlobal('window', { location: { pathname: '/coach', search: '?tab=1' } });
    return fetchMock;
  }

  it('sends JSON with the cookie and returns data', async () => {
    const fetchMock = stub(200, { data: { ok: true } });
    await expect(apiRequest('/api/x', { method: 'POST', body: { a: 1 } })).resolves.toEqual({ ok: true });
    const [, init] = fetchMock.mock.calls[0] as unknown as [string, RequestInit];
    expect(init.credentials).toBe('include');
    expect(init.body).toBe('{"a":1}');
    expect((init.headers as Record<string, string>)['Content-Type']).toBe('application/json');
  });

  it('returns undefined for 204', async () => {
    stub(204, undefined);
    await expect(apiRequest('/api/invitations/1', { method: 'DELETE' })).resolves.toBeUndefined();
  });

  it('throws ApiError and sends a lost session to sign-in with where it was', async () => {
    stub(401, { error: { code: 'unauthenticated', message: 'Sign in' } });
    const handler = vi.fn();
    setUnauthenticatedHandler(handler);
    await expect(apiRequest('/api/roster')).rejects.toMatchObject({ status: 401, code: 'unauthenticated' });
    expect(handler).toHaveBeenCalledWith('/coach?tab=1', null);

    handler.mockClear();
    await expect(apiRequest('/api/me')).rejects.toBeInstanceOf(ApiError);
    expect(handler).not.toHaveBeenCalled();
  });

  it('says why when the server answers that the session ended or was signed out elsewhere', async () => {
    const handler = vi.fn();
    setUnauthenticatedHandler(handler);
    stub(401, { error: { code: 'session_revoked', message: 'Signed out' } });
    await expect(apiRequest('/api/roster')).rejects.toMatchObject({ code: 'session_revoked' });
    expect(handler).toHaveBeenCalledWith('/coach?tab=1', 'signed-out');

    // /api/me never redirects, but its answer is remembered for the sign-in page.
    stub(401, { error: { code: 'session_ended', message: 'Ended' } });
    await expect(apiRequest('/api/me')).rejects.toMatchObject({ code: 'session_ended' });
    expect(sessionEndReason()).toBe('ended');
    clearSessionEnd();
  });

  it('turns a network failure into ApiError network_error', async () => {
    vi.stubGlobal(
      'fetch',
      vi.fn(async () => {
        throw new TypeError('Failed to fetch');
      }),
    );
    await expect(apiRequest('/api/me')).rejects.toMatchObject({ status: 0, code: 'network_error' });
  });
});
