/**
 * Idempotency keys for writes (the phone's outbox resends a write whose answer
 * it never saw). A non-GET request with an `Idempotency-Key` header from a
 * signed-in account is run once: the key is claimed in `idempotency_keys`
 * (unique per account) before the handler runs, and the response is stored
 * when it is sent. A replay of the key by the same account gets the stored
 * status and body (header `Idempotent-Replayed: true`) and writes nothing
 * again; a replay while the first is still running gets 409; the same key
 * with another request (method, path or body) gets 422. Answers that say
 * nothing about the write (401, 403, 408, 429, any 5xx, a dropped connection)
 * release the key so the client may try again.
 * Pattern after the IETF draft "The Idempotency-Key HTTP Header Field"
 * (draft-ietf-httpapi-idempotency-key-header).
 */
import { createHash } from 'node:crypto';
import type { RequestHandler, Response } from 'express';
import { UniqueConstraintError } from 'sequelize';
import { ApiError } from '@/server/errors';
import { IdempotencyKey } from '@/server/models';

export const IDEMPOTENCY_HEADER = 'idempotency-key';
const SAFE = new Set(['GET', 'HEAD', 'OPTIONS']);
/** 8–100 letters, digits, '-' or '_' (a UUID fits). */
const keyPattern = /^[A-Za-z0-9_-]{8,100}$/;
/** Statuses that do not settle the write: the key is released so a retry runs. */
const transient = (status: number) => status >= 500 || [401, 403, 408, 429].includes(status);

function requestHash(method: string, path: string, body: unknown): string {
  return createHash('sha256')
    .update(`${method} ${path}\n${JSON.stringify(body ?? null)}`)
    .digest('hex');
}

function replay(res: Response, stored: IdempotencyKey) {
  res.status(stored.statusCode ?? 200).set('Idempotent-Replayed', 'true');
  if (stored.responseBody === null || stored.statusCode === 204) return res.end();
  return res.type('application/json').send(stored.responseBody);
}

export function idempotency(): RequestHandler {
  return async (req, res, next) => {
    const key = req.get(IDEMPOTENCY_HEADER);
    const userId = req.session?.userId;
    if (SAFE.has(req.method) || key === undefined || !userId) return next();
    if (!keyPattern.test(key)) throw ApiError.badRequest('Idempotency-Key must be 8 to 100 letters, digits, - or _.');

    const path = req.originalUrl.split('?')[0].slice(0, 300);
    const hash = requestHash(req.method, path, req.body);
    let claimed: IdempotencyKey;
    try {
      claimed = await IdempotencyKey.create({
        userId,
        idemKey: key,
        method: req.method,
        path,
        requestHash: hash,
        statusCode: null,
        responseBody: null,
      });
    } catch (error) {
      if (!(error instanceof UniqueConstraintError)) throw error;
      const stored = await IdempotencyKey.findOne({ where: { userId, idemKey: key } });
      if (!stored) throw new ApiError(409, 'conflict', 'This write is being sent already; try again in a moment.');
      if (stored.requestHash !== hash) {
        throw new ApiError(422, 'idempotency_mismatch', 'This Idempotency-Key was used for another request.');
      }
      if (stored.statusCode === null) throw new ApiError(409, 'in_progress', 'This write is being sent already; try again in a moment.');
      return replay(res, stored);
    }

    let body: string | null = null;
    const json = res.json.bind(res);
    res.json = (value: unknown) => {
      body = JSON.stringify(value ?? null);
      return json(value);
    };
    let settled = false;
    res.on('finish', () => {
      settled = true;
      const status = res.statusCode;
      const done = transient(status) ? claimed.destroy() : claimed.update({ statusCode: status, responseBody: body });
      done.catch(() => undefined);
    });
    res.on('close', () => {
      if (!settled) claimed.destroy().catch(() => undefined);
    });
    next();
  };
}
