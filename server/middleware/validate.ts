/**
 * One validation step for params, query and body, with the same zod schemas
 * the client's forms use, typed for the handler after it.
 *
 * `route(schemas, handler)` checks the request's parts, replaces the raw
 * values with the parsed ones and runs the handler with them typed: a part
 * without a schema stays as Express gives it (the body is `unknown`, so a
 * handler cannot read an unchecked body). A failed check is a 400 naming the
 * field; the handler does not run.
 * Example:
 *   router.patch('/bows/:id', requireUser, route({ params: idParamSchema, body: bowUpdateSchema }, async (req, res) => {
 *     res.json({ bow: await bows.updateBow(currentUser(req), req.params.id, req.body) }); // id: number, body: BowUpdate
 *   }));
 * A route handler may be a guard too (call `next()`); it may run before
 * other middleware, e.g. before an upload is read (routes/photos.ts).
 */
import type { NextFunction, Request, RequestHandler, Response } from 'express';
import type { z, ZodTypeAny } from 'zod';
import { validationError } from '@/server/errors';

/** A schema for each part of the request to check (any may be left out). */
export type Schemas = { params?: ZodTypeAny; query?: ZodTypeAny; body?: ZodTypeAny };

type Parsed<Schema, Otherwise> = Schema extends ZodTypeAny ? z.output<Schema> : Otherwise;

/** The request after `schemas` were checked: params, body and query as parsed. */
export type ValidRequest<S extends Schemas> = Request<
  Parsed<S['params'], Request['params']>,
  unknown,
  Parsed<S['body'], unknown>,
  Parsed<S['query'], Request['query']>
>;

/** Checks the parts in place; the first failure as a 400, or null. */
function check(schemas: Schemas, req: Request): Error | null {
  for (const part of ['params', 'query', 'body'] as const) {
    const schema = schemas[part];
    if (!schema) continue;
    const result = schema.safeParse(req[part] ?? {});
    if (!result.success) return validationError(result.error, part === 'body' ? '' : part);
    // Express 5 makes req.query a getter; define the parsed value in its place.
    Object.defineProperty(req, part, { value: result.data, writable: true, configurable: true, enumerable: true });
  }
  return null;
}

/** A handler that runs once `schemas` have checked the request, with the parsed values typed. */
export function route<S extends Schemas>(
  schemas: S,
  handler: (req: ValidRequest<S>, res: Response, next: NextFunction) => unknown,
): RequestHandler {
  return (req, res, next) => {
    const error = check(schemas, req);
    if (error) return next(error);
    // Returned, so Express 5 passes a rejected promise to the error handler.
    return handler(req as unknown as ValidRequest<S>, res, next);
  };
}
