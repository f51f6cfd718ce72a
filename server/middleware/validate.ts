/**
 * One validation middleware for params, query and body, with the same zod
 * schemas the client's forms use. Parsed values replace the raw ones.
 */
import type { RequestHandler } from 'express';
import type { ZodTypeAny } from 'zod';
import { validationError } from '@/server/errors';

type Schemas = { params?: ZodTypeAny; query?: ZodTypeAny; body?: ZodTypeAny };

export function validate(schemas: Schemas): RequestHandler {
  return (req, _res, next) => {
    for (const part of ['params', 'query', 'body'] as const) {
      const schema = schemas[part];
      if (!schema) continue;
      const result = schema.safeParse(req[part] ?? {});
      if (!result.success) return next(validationError(result.error, part === 'body' ? '' : part));
      // Express 5 makes req.query a getter; define the parsed value in its place.
      Object.defineProperty(req, part, { value: result.data, writable: true, configurable: true, enumerable: true });
    }
    next();
  };
}
