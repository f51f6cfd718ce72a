/**
 * One error shape for every failure: {"error":{"code","message","fields?"}}.
 * Services throw ApiError; the one error handler turns anything into that shape.
 */
import type { ErrorRequestHandler, RequestHandler } from 'express';
import { ZodError } from 'zod';

export type FieldErrors = Record<string, string>;

export class ApiError extends Error {
  constructor(
    readonly status: number,
    readonly code: string,
    message: string,
    readonly fields?: FieldErrors,
  ) {
    super(message);
  }

  static badRequest(message: string, fields?: FieldErrors) {
    return new ApiError(400, 'validation_failed', message, fields);
  }
  static unauthorized(message = 'Sign in to continue.') {
    return new ApiError(401, 'unauthorized', message);
  }
  static forbidden(message = 'Your account may not do that.') {
    return new ApiError(403, 'forbidden', message);
  }
  static notFound(what = 'That record') {
    return new ApiError(404, 'not_found', `${what} was not found.`);
  }
  static conflict(message: string, fields?: FieldErrors) {
    return new ApiError(409, 'conflict', message, fields);
  }
}

/**
 * The record read back after a write, or a 404 when another request deleted
 * it (or its bow) in the meantime, rather than a crash on null.
 * Example: return checkJson(found(await loadCheck(id), 'That level check'));
 */
export function found<T>(value: T | null | undefined, what: string): T {
  if (value === null || value === undefined) throw ApiError.notFound(what);
  return value;
}

/** Zod issues → {"marks.1.distance": "…"}; the first problem per field wins. */
export function fieldErrors(error: ZodError, prefix = ''): FieldErrors {
  const fields: FieldErrors = {};
  for (const issue of error.issues) {
    const key = [prefix, ...issue.path.map(String)].filter(Boolean).join('.') || '_';
    if (!(key in fields)) fields[key] = issue.message;
  }
  return fields;
}

export function validationError(error: ZodError, prefix = ''): ApiError {
  const fields = fieldErrors(error, prefix);
  const count = Object.keys(fields).length;
  const first = Object.values(fields)[0];
  const message = count === 1 ? first : `Please correct the ${count} highlighted fields.`;
  return ApiError.badRequest(message, fields);
}

export const notFoundHandler: RequestHandler = (req, _res, next) => {
  next(new ApiError(404, 'not_found', `No such API path: ${req.method} ${req.originalUrl.split('?')[0]}`));
};

/** Status of an error thrown by the body parser, the URL decoder or another library (http-errors), when it is a 4xx. */
function statusOf(err: unknown): number | null {
  if (!err || typeof err !== 'object') return null;
  const status = (err as { status?: unknown; statusCode?: unknown }).status ?? (err as { statusCode?: unknown }).statusCode;
  return typeof status === 'number' && status >= 400 && status < 500 ? status : null;
}

/**
 * What the body parser (raw-body, http-errors), the router's URL decoder and
 * the like throw for a request they cannot read, as an ApiError; null for
 * anything else. Their own messages are not sent (they name internals).
 * Example: clientError({ status: 415, type: 'charset.unsupported' }).message → 'Send the request body as UTF-8 JSON.'
 */
export function clientError(err: unknown): ApiError | null {
  const type = (err as { type?: unknown } | null)?.type;
  if (type === 'charset.unsupported') return new ApiError(415, 'unsupported_charset', 'Send the request body as UTF-8 JSON.');
  if (type === 'encoding.unsupported') {
    return new ApiError(
      415,
      'unsupported_encoding',
      "The request body's Content-Encoding is not supported; send it plain or gzip, deflate or br.",
    );
  }
  if (err instanceof URIError) return new ApiError(400, 'bad_url', 'The address has broken percent-encoding.');
  const status = statusOf(err);
  if (status === null) return null;
  if (status === 413) return new ApiError(413, 'too_large', 'The request is too large.');
  if (status === 415) return new ApiError(415, 'unsupported_type', "The request's content type or encoding is not supported.");
  if (status === 400 && /decod|param/i.test(String((err as Error).message))) {
    return new ApiError(400, 'bad_request', 'The request could not be read: its address or body is not encoded correctly.');
  }
  return new ApiError(status, status === 404 ? 'not_found' : 'bad_request', 'The request could not be read.');
}

/**
 * Two requests writing the same rows at once: MariaDB picks a deadlock victim
 * (error 1213) or gives up waiting for a lock (1205), or a row referred to was
 * deleted by the other request meanwhile (a foreign-key failure). The
 * transaction was rolled back; the client may simply send it again.
 */
function concurrentChange(err: unknown): boolean {
  const e = err as { name?: string; parent?: { errno?: number }; original?: { errno?: number } } | null;
  if (!e) return false;
  if (e.name === 'SequelizeForeignKeyConstraintError' || e.name === 'SequelizeTimeoutError') return true;
  const errno = e.parent?.errno ?? e.original?.errno;
  return e.name === 'SequelizeDatabaseError' && (errno === 1213 || errno === 1205);
}

export const errorHandler: ErrorRequestHandler = (err, _req, res, _next) => {
  let apiError: ApiError;
  if (err instanceof ApiError) apiError = err;
  else if (err instanceof ZodError) apiError = validationError(err);
  else if (err?.type === 'entity.parse.failed') apiError = new ApiError(400, 'bad_json', 'The request body is not valid JSON.');
  else if (err?.type === 'entity.too.large') apiError = new ApiError(413, 'too_large', 'The request is too large.');
  else if (clientError(err)) apiError = clientError(err)!;
  else if (err?.name === 'SequelizeUniqueConstraintError') apiError = ApiError.conflict('That record already exists.');
  else if (concurrentChange(err)) {
    apiError = new ApiError(
      409,
      'concurrent_change',
      'These records were being changed by another request at the same moment. Nothing was saved; try again.',
    );
  } else if (err?.name === 'SequelizeConnectionRefusedError' || err?.name === 'SequelizeConnectionError') {
    apiError = new ApiError(503, 'db_unavailable', 'The database is not reachable; try again shortly.');
  } else {
    // Logged on the server (never sent to the client); quiet under Jest unless asked for.
    if (process.env.NODE_ENV !== 'test' || process.env.PINWRIGHT_LOG_ERRORS) console.error(err);
    apiError = new ApiError(500, 'internal', 'Something went wrong on our side. Nothing was saved.');
  }
  if (res.headersSent) return;
  const body: { error: { code: string; message: string; fields?: FieldErrors } } = {
    error: { code: apiError.code, message: apiError.message },
  };
  if (apiError.fields) body.error.fields = apiError.fields;
  res.status(apiError.status).json(body);
};
