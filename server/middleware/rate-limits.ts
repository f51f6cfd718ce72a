/**
 * The account rate limits, made once per app (createApp puts them in
 * app.locals) so that every route that shares a limit shares one counter:
 * one sign-up limit for every route that creates an account, three sign-in
 * limits (OWASP Authentication Cheat Sheet, "Protect against automated
 * attacks": per address across e-mails against password spraying, per
 * address and e-mail, per e-mail across addresses), and invitations per
 * inviting account. Numbers in config.limits (README, configuration).
 *
 * Example: router.post('/sign-up', limit('signUp'), …)
 */
import type { Request, RequestHandler } from 'express';
import { rateLimit, ipKeyGenerator, type Options } from 'express-rate-limit';
import { config } from '@/server/config';
import { ApiError } from '@/server/errors';

const minutes = (n: number) => n * 60 * 1000;

const emailOf = (req: Request) => (typeof req.body?.email === 'string' ? req.body.email.trim().toLowerCase() : '');
const addressOf = (req: Request) => ipKeyGenerator(req.ip ?? '');

function limiter(options: Partial<Options> & { message: string }): RequestHandler {
  const { message, ...rest } = options;
  return rateLimit({
    standardHeaders: 'draft-8',
    legacyHeaders: false,
    handler: (_req, _res, next) => next(new ApiError(429, 'rate_limited', message)),
    ...rest,
  });
}

export function createRateLimits(limits = config.limits) {
  const signInMessage = 'Too many sign-in attempts. Wait 15 minutes and try again.';
  return {
    /** POST /api/auth/sign-in: three limits in a row. */
    signIn: [
      limiter({
        windowMs: minutes(15),
        limit: limits.signInFailuresPerAddress,
        keyGenerator: (req) => `address|${addressOf(req)}`,
        skipSuccessfulRequests: true,
        message: signInMessage,
      }),
      limiter({
        windowMs: minutes(15),
        limit: limits.signInPerAddressAndEmail,
        keyGenerator: (req) => `address-email|${addressOf(req)}|${emailOf(req)}`,
        message: signInMessage,
      }),
      limiter({
        windowMs: minutes(15),
        limit: limits.signInFailuresPerEmail,
        keyGenerator: (req) => `email|${emailOf(req)}`,
        skipSuccessfulRequests: true,
        message: signInMessage,
      }),
    ],
    /** Every route that creates an account (sign-up, accept an invitation with a new account): one counter per address. */
    signUp: limiter({
      windowMs: minutes(60),
      limit: limits.signUpsPerAddress,
      keyGenerator: (req) => addressOf(req),
      message: 'Too many new accounts from this address. Try again in an hour.',
    }),
    /** POST /api/bows/:bowId/shares, behind requireUser: per inviting account, so a shared address (a shop's Wi-Fi) is no bar. */
    invite: limiter({
      windowMs: minutes(60),
      limit: limits.invitesPerAccount,
      keyGenerator: (req) => `account|${req.user?.id ?? addressOf(req)}`,
      message: `You have sent ${limits.invitesPerAccount} invitations in the last hour. Try again later.`,
    }),
  };
}

export type RateLimits = ReturnType<typeof createRateLimits>;

/**
 * The app's limit by name (app.locals.rateLimits, made by createApp).
 * Example: router.post('/invites/accept-new', limit('signUp'), …)
 */
export function limit(name: keyof RateLimits): RequestHandler {
  return (req, res, next) => {
    const limits = req.app.locals.rateLimits as RateLimits | undefined;
    if (!limits) return next(new Error('createApp did not set app.locals.rateLimits'));
    const chain = ([] as RequestHandler[]).concat(limits[name]);
    let i = 0;
    const step = (err?: unknown) => {
      if (err) return next(err);
      const handler = chain[i++];
      if (!handler) return next();
      Promise.resolve(handler(req, res, step)).catch(next);
    };
    step();
  };
}
