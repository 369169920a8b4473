import type { ErrorCode } from '@driftmark/shared';
import { noteSessionEnd, type SessionEndReason } from './session-end';

/** Codes the client adds for failures that never reached (or never came back from) the API. */
export type ClientErrorCode = 'network_error' | 'unexpected_response';

/** The one error type every API call raises. */
export class ApiError extends Error {
  override readonly name = 'ApiError';
  readonly status: number;
  readonly code: ErrorCode | ClientErrorCode;
  /** Field path (dot-joined, as the API sends it) → message, for validation_failed. */
  readonly fields: Record<string, string>;
  /**
   * For guardrails_unacknowledged: the server's warnings as sent (empty when the body had none).
   * Read them through `unacknowledgedWarning` (shared) where they are used: parsing them here would
   * put zod on the first route.
   */
  readonly warnings: readonly unknown[];
  readonly requestId: string | undefined;

  constructor(init: {
    status: number;
    code: ErrorCode | ClientErrorCode;
    message: string;
    fields?: Record<string, string>;
    warnings?: readonly unknown[];
    requestId?: string;
  }) {
    super(init.message);
    this.status = init.status;
    this.code = init.code;
    this.fields = init.fields ?? {};
    this.warnings = init.warnings ?? [];
    this.requestId = init.requestId;
  }
}

export function isApiError(error: unknown): error is ApiError {
  return error instanceof ApiError;
}

const FALLBACK_MESSAGES: Record<number, { code: ErrorCode; message: string }> = {
  400: { code: 'validation_failed', message: 'Some of the details need another look.' },
  401: { code: 'unauthenticated', message: 'Please sign in again.' },
  403: { code: 'forbidden', message: 'You are not allowed to do that.' },
  404: { code: 'not_found', message: 'We could not find that.' },
  409: { code: 'conflict', message: 'That clashes with something that already exists.' },
  410: { code: 'token_invalid', message: 'This link has expired or was already used.' },
  413: { code: 'payload_too_large', message: 'That is too large to send.' },
  429: { code: 'rate_limited', message: 'Too many attempts. Please wait a few minutes and try again.' },
  503: { code: 'db_unavailable', message: 'Driftmark is briefly unavailable. Please try again shortly.' },
};

function isRecord(value: unknown): value is Record<string, unknown> {
  return typeof value === 'object' && value !== null && !Array.isArray(value);
}

function stringFields(value: unknown): Record<string, string> | undefined {
  if (!isRecord(value)) return undefined;
  const out: Record<string, string> = {};
  for (const [key, message] of Object.entries(value)) {
    if (typeof message === 'string') out[key] = message;
  }
  return out;
}

/**
 * Turns a failed response (status and parsed body, or undefined when the body was not JSON) into an
 * ApiError. Pure, so the mapping can be tested without a network.
 */
export function parseErrorBody(status: number, body: unknown): ApiError {
  const fallback = FALLBACK_MESSAGES[status] ?? {
    code: 'internal_error' as const,
    message: 'Something went wrong on our side. Please try again.',
  };
  const error = isRecord(body) && isRecord(body.error) ? body.error : undefined;
  if (!error || typeof error.code !== 'string') {
    return new ApiError({ status, code: fallback.code, message: fallback.message });
  }
  return new ApiError({
    status,
    code: error.code as ErrorCode,
    message: typeof error.message === 'string' && error.message ? error.message : fallback.message,
    fields: stringFields(error.fields),
    warnings:
      error.code === 'guardrails_unacknowledged' && Array.isArray(error.warnings)
        ? error.warnings
        : undefined,
    requestId: typeof error.requestId === 'string' ? error.requestId : undefined,
  });
}

/** A success body `{ data, abilities? }` → data; a body without an envelope is returned as is. */
export function unwrapData<T>(body: unknown): T {
  if (isRecord(body) && 'data' in body) return body.data as T;
  return body as T;
}

/** What the server allows the signed-in user to do with a resource (never re-derived here). */
export type Abilities = Record<string, boolean>;

export interface WithAbilities<T> {
  data: T;
  abilities: Abilities;
}

/** A success body whose `abilities` map matters to the screen. */
export function unwrapWithAbilities<T>(body: unknown): WithAbilities<T> {
  const data = unwrapData<T>(body);
  const abilities = isRecord(body) && isRecord(body.abilities) ? body.abilities : {};
  const clean: Abilities = {};
  for (const [k, v] of Object.entries(abilities)) clean[k] = v === true;
  return { data, abilities: clean };
}

/** A success body whose `meta` (beside `data`) matters, e.g. the urgent-symptom message. */
export interface WithMeta<T> {
  data: T;
  meta: Record<string, unknown>;
}

export function unwrapWithMeta<T>(body: unknown): WithMeta<T> {
  const data = unwrapData<T>(body);
  const meta = isRecord(body) && isRecord(body.meta) ? body.meta : {};
  return { data, meta };
}

/** Paths whose 401 is an answer, not a lost session: never bounce these to sign-in. */
const NO_REDIRECT_ON_401 = ['/api/me', '/api/auth/sign-in', '/api/auth/sign-out'];

type UnauthenticatedHandler = (next: string, reason: SessionEndReason | null) => void;

let onUnauthenticated: UnauthenticatedHandler = (next, reason) => {
  window.location.assign(`/sign-in?next=${encodeURIComponent(next)}${reason ? `&reason=${reason}` : ''}`);
};

/** The app decides how to reach sign-in (router navigation, clearing the cache). */
export function setUnauthenticatedHandler(handler: UnauthenticatedHandler): void {
  onUnauthenticated = handler;
}

export function shouldRedirectOn401(path: string): boolean {
  const bare = path.split('?')[0] ?? path;
  return !NO_REDIRECT_ON_401.includes(bare);
}

export interface RequestOptions {
  method?: 'GET' | 'POST' | 'PUT' | 'PATCH' | 'DELETE';
  body?: unknown;
  signal?: AbortSignal;
}

interface RawOptions extends RequestOptions {
  /** Whether a 401 on this call means "the session is gone" (send the user to sign-in). */
  redirectOn401?: boolean;
}

async function readJson(response: Response): Promise<unknown> {
  if (response.status === 204) return undefined;
  const text = await response.text();
  if (!text) return undefined;
  try {
    return JSON.parse(text) as unknown;
  } catch {
    return undefined;
  }
}

/**
 * Calls the Driftmark API with the session cookie, sends and reads JSON and raises ApiError for
 * anything but a 2xx (or a 304 when `ifNoneMatch` was sent). Returns the response and its parsed body.
 */
async function send(
  path: string,
  options: RawOptions & { ifNoneMatch?: string },
): Promise<{ response: Response; parsed: unknown }> {
  const { method = 'GET', body, signal, redirectOn401 = shouldRedirectOn401(path), ifNoneMatch } = options;
  let response: Response;
  try {
    response = await fetch(path, {
      method,
      credentials: 'include',
      headers: {
        Accept: 'application/json',
        ...(body === undefined ? {} : { 'Content-Type': 'application/json' }),
        ...(ifNoneMatch === undefined ? {} : { 'If-None-Match': ifNoneMatch }),
      },
      body: body === undefined ? undefined : JSON.stringify(body),
      signal,
    });
  } catch (cause) {
    if (cause instanceof DOMException && cause.name === 'AbortError') throw cause;
    throw new ApiError({
      status: 0,
      code: 'network_error',
      message: 'Driftmark could not be reached. Check your connection and try again.',
    });
  }

  const parsed = await readJson(response);
  if (!response.ok && !(response.status === 304 && ifNoneMatch !== undefined)) {
    const error = parseErrorBody(response.status, parsed);
    // A session that ended says so once (the cookie goes with that answer): remember why for sign-in.
    const reason = response.status === 401 ? noteSessionEnd(error.code) : null;
    if (response.status === 401 && redirectOn401) {
      onUnauthenticated(`${window.location.pathname}${window.location.search}`, reason);
    }
    throw error;
  }
  return { response, parsed };
}

async function requestRaw(path: string, options: RawOptions = {}): Promise<unknown> {
  return (await send(path, options)).parsed;
}

/** What a conditional GET answers: the same as before (304), or new data with its tag. */
export type ConditionalResult<T> =
  { notModified: true } | { notModified: false; data: T; etag: string | null };

/** An API call whose `data` is all the caller needs. */
export async function apiRequest<T>(path: string, options: RequestOptions = {}): Promise<T> {
  return unwrapData<T>(await requestRaw(path, options));
}

export const api = {
  get: <T>(path: string, signal?: AbortSignal) => apiRequest<T>(path, { signal }),
  /** GET of an answer without the `{ data }` envelope (the OpenAPI description). */
  getBare: async <T>(path: string, signal?: AbortSignal) => (await requestRaw(path, { signal })) as T,
  /** GET keeping the `abilities` map beside `data`. */
  getWithAbilities: async <T>(path: string, signal?: AbortSignal) =>
    unwrapWithAbilities<T>(await requestRaw(path, { signal })),
  /** GET sending `etag` (when known) as If-None-Match: a 304 means the data held is still current. */
  getConditional: async <T>(
    path: string,
    etag: string | undefined,
    signal?: AbortSignal,
  ): Promise<ConditionalResult<T>> => {
    const { response, parsed } = await send(path, { signal, ifNoneMatch: etag });
    if (response.status === 304) return { notModified: true };
    return { notModified: false, data: unwrapData<T>(parsed), etag: response.headers.get('ETag') };
  },
  post: <T>(path: string, body?: unknown) => apiRequest<T>(path, { method: 'POST', body }),
  /** POST keeping the `meta` map beside `data`. */
  postWithMeta: async <T>(path: string, body?: unknown) =>
    unwrapWithMeta<T>(await requestRaw(path, { method: 'POST', body })),
  put: <T>(path: string, body?: unknown) => apiRequest<T>(path, { method: 'PUT', body }),
  patch: <T>(path: string, body?: unknown) => apiRequest<T>(path, { method: 'PATCH', body }),
  delete: <T = void>(path: string) => apiRequest<T>(path, { method: 'DELETE' }),
};

/** Retry rule for queries: never repeat a 4xx (the answer will not change), at most twice otherwise. */
export function shouldRetry(failureCount: number, error: unknown): boolean {
  if (isApiError(error) && error.status >= 400 && error.status < 500) return false;
  return failureCount < 2;
}
