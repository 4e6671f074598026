import type { z } from 'zod';
import { apiErrorSchema } from '@shared/schemas/common';

/** The path that hands out the CSRF token for the current session. */
export const CSRF_PATH = '/api/auth/csrf';
/** The header the server reads the CSRF token from on every change. */
export const CSRF_HEADER = 'x-csrf-token';

const NETWORK_MESSAGE = 'Grovewalk could not be reached. Check your connection and try again.';
const UNREADABLE_MESSAGE = 'The server sent an answer this page cannot read. Reload the page and try again.';

/** Thrown by every failed call, so screens can branch on `code` and put `fields` beside inputs. */
export class ApiError extends Error {
  readonly status: number;
  readonly code: string;
  readonly fields: Readonly<Record<string, string>>;
  /** Seconds from a Retry-After header (rate limits), when the server sent one. */
  readonly retryAfterSeconds: number | null;

  constructor(init: { status: number; code: string; message: string; fields?: Record<string, string>; retryAfterSeconds?: number | null }) {
    super(init.message);
    this.name = 'ApiError';
    this.status = init.status;
    this.code = init.code;
    this.fields = init.fields ?? {};
    this.retryAfterSeconds = init.retryAfterSeconds ?? null;
  }
}

/** Narrows unknown errors from queries and mutations; with `code`, also checks the server's code. */
export function isApiError(error: unknown, code?: string): error is ApiError {
  return error instanceof ApiError && (code === undefined || error.code === code);
}

/** Readable text for any thrown value, for error states that do not branch on codes. */
export function errorMessage(error: unknown): string {
  if (error instanceof ApiError) return error.message;
  return 'Something went wrong on this page. Reload it and try again.';
}

type Method = 'GET' | 'POST' | 'PUT' | 'PATCH' | 'DELETE';
type QueryValue = string | number | boolean | null | undefined;

/** Options for one call; `schema` checks the response body against the shared contract. */
export interface RequestOptions<T> {
  method?: Method;
  body?: unknown;
  query?: Record<string, QueryValue>;
  schema?: z.ZodType<T>;
  signal?: AbortSignal;
  /** Set on calls that sign in or out: the server starts a new session, so the old token is dropped. */
  sessionChange?: boolean;
}

let csrfPromise: Promise<string> | null = null;

/**
 * Drops the cached CSRF token; the next change fetches a fresh one. Called after sign-in and
 * sign-out because the server issues a new session (and token) at those moments.
 */
export function forgetCsrfToken(): void {
  csrfPromise = null;
}

function csrfToken(): Promise<string> {
  if (!csrfPromise) {
    const pending = fetchCsrfToken();
    csrfPromise = pending;
    // A failed fetch must not stick: the next change tries again.
    pending.catch(() => {
      if (csrfPromise === pending) csrfPromise = null;
    });
  }
  return csrfPromise;
}

async function fetchCsrfToken(): Promise<string> {
  const res = await send(CSRF_PATH, { method: 'GET', headers: { accept: 'application/json' } });
  if (!res.ok) throw await errorFrom(res);
  const body: unknown = await readJson(res);
  const token = typeof body === 'object' && body !== null ? (body as { token?: unknown }).token : undefined;
  if (typeof token !== 'string' || token.length === 0) {
    throw new ApiError({ status: res.status, code: 'bad_response', message: UNREADABLE_MESSAGE });
  }
  return token;
}

/** Builds `path?query`, leaving out empty values so URLs stay short and cache keys stable. */
export function withQuery(path: string, query?: Record<string, QueryValue>): string {
  if (!query) return path;
  const params = new URLSearchParams();
  for (const [key, value] of Object.entries(query)) {
    if (value === undefined || value === null || value === '') continue;
    params.set(key, String(value));
  }
  const qs = params.toString();
  return qs ? `${path}?${qs}` : path;
}

async function send(url: string, init: RequestInit): Promise<Response> {
  try {
    return await globalThis.fetch(url, { ...init, credentials: 'same-origin' });
  } catch (error) {
    if (init.signal?.aborted) throw error;
    throw new ApiError({ status: 0, code: 'network', message: NETWORK_MESSAGE });
  }
}

async function readJson(res: Response): Promise<unknown> {
  const text = await res.text();
  if (text.trim() === '') return undefined;
  try {
    return JSON.parse(text) as unknown;
  } catch {
    throw new ApiError({ status: res.status, code: 'bad_response', message: UNREADABLE_MESSAGE });
  }
}

function retryAfter(res: Response): number | null {
  return retryAfterSecondsOf(res.headers.get('retry-after'));
}

function retryAfterSecondsOf(raw: string | null): number | null {
  if (!raw) return null;
  const seconds = Number(raw);
  if (Number.isFinite(seconds) && seconds >= 0) return Math.ceil(seconds);
  const at = Date.parse(raw);
  return Number.isNaN(at) ? null : Math.max(0, Math.ceil((at - Date.now()) / 1000));
}

function errorFromBody(status: number, body: unknown, retryAfterSeconds: number | null): ApiError {
  const parsed = apiErrorSchema.safeParse(body);
  if (parsed.success) {
    const { code, message, fields } = parsed.data.error;
    return new ApiError({ status, code, message, fields, retryAfterSeconds });
  }
  return new ApiError({
    status,
    code: status >= 500 ? 'server_error' : 'http_error',
    message:
      status >= 500
        ? 'The server ran into a problem. Try again in a moment.'
        : `Grovewalk could not do that (error ${status}). Reload the page and try again.`,
    retryAfterSeconds,
  });
}

/** Turns a failed response into an ApiError, whether or not it carries the usual error body. */
async function errorFrom(res: Response): Promise<ApiError> {
  let body: unknown;
  try {
    body = await readJson(res);
  } catch {
    body = undefined;
  }
  return errorFromBody(res.status, body, retryAfter(res));
}

/**
 * The same ApiError apiRequest would throw, for an answer read outside fetch (uploads go over
 * XMLHttpRequest, the only browser API that reports upload progress). Status 0 means the request
 * never got an answer.
 */
export function apiErrorFrom(status: number, bodyText: string, retryAfterHeader: string | null = null): ApiError {
  if (status === 0) return new ApiError({ status: 0, code: 'network', message: NETWORK_MESSAGE });
  let body: unknown;
  try {
    body = bodyText.trim() === '' ? undefined : (JSON.parse(bodyText) as unknown);
  } catch {
    body = undefined;
  }
  return errorFromBody(status, body, retryAfterSecondsOf(retryAfterHeader));
}

/** The CSRF header for a change sent outside apiRequest (an upload over XMLHttpRequest). */
export async function csrfHeader(): Promise<Record<string, string>> {
  return { [CSRF_HEADER]: await csrfToken() };
}

/**
 * The one way the client talks to the API: JSON both ways, same-origin cookies, the CSRF header
 * on every change (retried once with a fresh token when the server says it went stale), and an
 * ApiError for anything that is not a success.
 */
export async function apiRequest<T = unknown>(path: string, options: RequestOptions<T> = {}): Promise<T> {
  const method = options.method ?? 'GET';
  const changes = method !== 'GET';
  const url = withQuery(path, options.query);

  const attempt = async (isRetry: boolean): Promise<T> => {
    const headers: Record<string, string> = { accept: 'application/json' };
    if (options.body !== undefined) headers['content-type'] = 'application/json';
    if (changes) headers[CSRF_HEADER] = await csrfToken();

    const res = await send(url, {
      method,
      headers,
      body: options.body === undefined ? undefined : JSON.stringify(options.body),
      signal: options.signal,
    });

    if (!res.ok) {
      const error = await errorFrom(res);
      if (changes && !isRetry && error.status === 403 && error.code === 'csrf_invalid') {
        forgetCsrfToken();
        return attempt(true);
      }
      throw error;
    }

    if (options.sessionChange) forgetCsrfToken();
    const data = res.status === 204 ? undefined : await readJson(res);
    if (!options.schema) return data as T;
    const checked = options.schema.safeParse(data);
    if (!checked.success) throw new ApiError({ status: res.status, code: 'bad_response', message: UNREADABLE_MESSAGE });
    return checked.data;
  };

  return attempt(false);
}

type BodyOptions<T> = Omit<RequestOptions<T>, 'method' | 'body'>;

/** Short forms of apiRequest, one per verb, for the feature fetchers. */
export const api = {
  get: <T = unknown>(path: string, options?: Omit<RequestOptions<T>, 'method' | 'body'>) => apiRequest<T>(path, { ...options, method: 'GET' }),
  post: <T = unknown>(path: string, body?: unknown, options?: BodyOptions<T>) => apiRequest<T>(path, { ...options, method: 'POST', body }),
  put: <T = unknown>(path: string, body?: unknown, options?: BodyOptions<T>) => apiRequest<T>(path, { ...options, method: 'PUT', body }),
  patch: <T = unknown>(path: string, body?: unknown, options?: BodyOptions<T>) => apiRequest<T>(path, { ...options, method: 'PATCH', body }),
  delete: <T = unknown>(path: string, options?: BodyOptions<T>) => apiRequest<T>(path, { ...options, method: 'DELETE' }),
};
