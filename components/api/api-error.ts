/**
 * A failed API call, carrying the server's error shape
 * `{ error: { code, message, fields? } }` plus the HTTP status.
 * Network failures use status 0 and code "network".
 *
 * Example: `new ApiError(409, 'conflict', 'That e-mail already has an account')`
 */
export class ApiError extends Error {
  readonly status: number;
  readonly code: string;
  /** Per-field messages from a validation failure, keyed by field name. */
  readonly fields: Record<string, string>;

  constructor(status: number, code: string, message: string, fields: Record<string, string> = {}) {
    super(message);
    // Keeps `instanceof ApiError` true when the class is down-compiled.
    Object.setPrototypeOf(this, ApiError.prototype);
    this.name = 'ApiError';
    this.status = status;
    this.code = code;
    this.fields = fields;
  }
}

/** True when `error` is an ApiError, optionally with the given HTTP status. */
export function isApiError(error: unknown, status?: number): error is ApiError {
  return error instanceof ApiError && (status === undefined || error.status === status);
}
