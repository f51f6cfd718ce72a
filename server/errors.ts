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
  next(new ApiError(404, 'not_found', `No such API path: ${req.method} ${req.originalUrl.split("?")[0]}`));
};

export const errorHandler: ErrorRequestHandler = (err, _req, res, _next) => {
  let apiError: ApiError;
  if (err instanceof ApiError) apiError = err;
  else if (err instanceof ZodError) apiError = validationError(err);
  else if (err?.type === 'entity.parse.failed') apiError = new ApiError(400, 'bad_json', 'The request body is not valid JSON.');
  else if (err?.type === 'entity.too.large') apiError = new ApiError(413, 'too_large', 'The request is too large.');
  else if (err?.name === 'SequelizeUniqueConstraintError') apiError = ApiError.conflict('That record already exists.');
  else if (err?.name === 'SequelizeConnectionRefusedError' || err?.name === 'SequelizeConnectionError') {
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
