/**
 * CSRF defence for a cookie-authenticated JSON API (OWASP CSRF Prevention Cheat
 * Sheet: "custom request headers" and "verifying origin with standard headers").
 * A cross-site HTML form cannot set a custom header, and a cross-site script
 * cannot either without a CORS pre-flight, which this server never grants.
 */
import type { RequestHandler } from 'express';
import { ApiError } from '@/server/errors';

export const CSRF_HEADER = 'x-pinwright-csrf';
const SAFE = new Set(['GET', 'HEAD', 'OPTIONS']);

export const csrfGuard: RequestHandler = (req, _res, next) => {
  if (SAFE.has(req.method)) return next();
  if (req.get(CSRF_HEADER) !== '1') {
    return next(new ApiError(403, 'csrf', 'This request did not come from the Pinwright app; reload the page and try again.'));
  }
  const origin = req.get('origin');
  if (origin) {
    let originHost = '';
    try {
      originHost = new URL(origin).host;
    } catch {
      originHost = '';
    }
    if (originHost !== req.get('host')) {
      return next(new ApiError(403, 'csrf', 'This request came from another site and was refused.'));
    }
  }
  next();
};
