import type { ZodType, ZodTypeDef } from 'zod';

import { ApiError } from '@/components/api/api-error';

export { ApiError, isApiError } from '@/components/api/api-error';

export type ApiMethod = 'GET' | 'POST' | 'PUT' | 'PATCH' | 'DELETE';

/** How a successful answer is read: JSON (the default), or a drawn file as text (SVG) or as a Blob (PDF, to save). */
export type ApiResponseType = 'json' | 'text' | 'blob';

export interface ApiFetchOptions<T> {
  method?: ApiMethod;
  /** Sent as JSON; a FormData (a file upload) is sent as multipart form data. */
  body?: unknown;
  /** When given, the response body is parsed with it (a mismatch throws ApiError "bad_response"). */
  schema?: ZodType<T, ZodTypeDef, unknown>;
  signal?: AbortSignal;
  /** Extra request headers, e.g. `{ 'Idempotency-Key': id }` on a write the outbox may send again. */
  headers?: Record<string, string>;
  /**
   * 'text' or 'blob' for a file the API draws (tape or sheet SVG, sheet PDF):
   * the answer is returned as it came, unchecked; a failure is still an ApiError
   * from the server's JSON error. Default 'json'.
   */
  responseType?: ApiResponseType;
}

/** Options for a drawn file (no schema: the answer is not JSON). */
type FileFetchOptions = Omit<ApiFetchOptions<never>, 'schema' | 'responseType'>;

/** Header naming one write, so the server runs it once however often it is sent (server/middleware/idempotency.ts). */
export const idempotencyHeader = 'Idempotency-Key';

/** Header the server requires on every state-changing request (its CSRF defence). */
export const csrfHeader = 'X-Pinwright-Csrf';

const statusCodes: Record<number, string> = {
  400: 'validation_failed',
  401: 'unauthorized',
  403: 'forbidden',
  404: 'not_found',
  409: 'conflict',
  413: 'too_large',
  429: 'rate_limited',
};

const statusMessages: Record<string, string> = {
  validation_failed: 'Some of what you entered needs another look.',
  unauthorized: 'Please sign in.',
  forbidden: 'You do not have access to that.',
  not_found: 'That was not found.',
  conflict: 'That clashes with something already saved.',
  too_large: 'That file is too large to send.',
  rate_limited: 'Too many tries. Wait a minute, then try again.',
  server_error: 'Something went wrong on our side. Try again in a moment.',
};

function stringRecord(value: unknown): Record<string, string> {
  if (!value || typeof value !== 'object') return {};
  const out: Record<string, string> = {};
  for (const [key, message] of Object.entries(value)) {
    if (typeof message === 'string') out[key] = message;
  }
  return out;
}

/** Builds an ApiError from a failed response's status and (maybe) JSON body. */
function errorFrom(status: number, payload: unknown): ApiError {
  const error = (payload as { error?: { code?: unknown; message?: unknown; fields?: unknown } } | null)?.error;
  const code = typeof error?.code === 'string' ? error.code : (statusCodes[status] ?? (status >= 500 ? 'server_error' : 'error'));
  const message =
    typeof error?.message === 'string' && error.message ? error.message : (statusMessages[code] ?? `The request failed (HTTP ${status}).`);
  return new ApiError(status, code, message, stringRecord(error?.fields));
}

/**
 * Lets the browser handle input and paint before a response is checked against
 * its schema, so that two answers arriving together (the sign-in check and the
 * Bench's bows, on a cold load) are checked in two short tasks rather than one
 * long one. Where the browser has no `scheduler.yield` (WICG Prioritized Task
 * Scheduling; Chromium only, for now), it goes straight on.
 */
function yieldToBrowser(): Promise<void> | undefined {
  const scheduler = (globalThis as { scheduler?: { yield?: () => Promise<void> } }).scheduler;
  return typeof scheduler?.yield === 'function' ? scheduler.yield() : undefined;
}

/**
 * The one way the web client talks to the API: JSON in and out (or a drawn
 * file out, with `responseType`), same-origin cookies, the CSRF header on
 * every non-GET request, and an ApiError on any failure. A 204 resolves to
 * undefined.
 *
 * Example: `await apiFetch('/api/auth/sign-in', { method: 'POST', body: { email, password } })`
 *   → `{ user: {...} }`, or throws ApiError(401, 'unauthorized', 'E-mail or password is wrong')
 * Example: `await apiFetch('/api/sight-ins/4/sheet.svg?paper=a4', { responseType: 'text' })` → '<svg …'
 */
export function apiFetch(path: string, options: FileFetchOptions & { responseType: 'text' }): Promise<string>;
export function apiFetch(path: string, options: FileFetchOptions & { responseType: 'blob' }): Promise<Blob>;
export function apiFetch<T = unknown>(path: string, options?: ApiFetchOptions<T>): Promise<T>;
export async function apiFetch<T = unknown>(path: string, options: ApiFetchOptions<T> = {}): Promise<T> {
  const method = options.method ?? 'GET';
  const responseType = options.responseType ?? 'json';
  const headers: Record<string, string> = { Accept: responseType === 'json' ? 'application/json' : '*/*', ...options.headers };
  const multipart = typeof FormData !== 'undefined' && options.body instanceof FormData;
  // The browser writes a multipart body's Content-Type itself (with its boundary).
  if (options.body !== undefined && !multipart) headers['Content-Type'] = 'application/json';
  if (method !== 'GET') headers[csrfHeader] = '1';

  let res: Response;
  try {
    res = await fetch(path, {
      method,
      headers,
      credentials: 'same-origin',
      body: options.body === undefined ? undefined : multipart ? (options.body as FormData) : JSON.stringify(options.body),
      signal: options.signal,
    });
  } catch (cause) {
    if ((cause as { name?: string } | null)?.name === 'AbortError') throw cause;
    throw new ApiError(0, 'network', 'Cannot reach Pinwright. Check your connection and try again.');
  }

  const isJson = (res.headers.get('content-type') ?? '').includes('json');
  if (res.ok && responseType === 'text') return (await res.text()) as T;
  if (res.ok && responseType === 'blob') return (await res.blob()) as T;

  let payload: unknown = undefined;
  if (res.status !== 204 && isJson) {
    try {
      payload = await res.json();
    } catch {
      payload = undefined;
    }
  }

  if (!res.ok) throw errorFrom(res.status, payload);
  if (res.status === 204) return undefined as T;
  if (!isJson) throw new ApiError(res.status, 'bad_response', 'The server sent an answer we could not read.');
  if (!options.schema) return payload as T;

  await yieldToBrowser();
  const parsed = options.schema.safeParse(payload);
  if (!parsed.success) throw new ApiError(res.status, 'bad_response', 'The server sent an answer we could not read.');
  return parsed.data;
}
