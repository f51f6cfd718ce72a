/**
 * Sessions in MariaDB (express-session + connect-session-sequelize), so any
 * number of stateless app servers can share them. `disableTouch` stops an
 * UPDATE on every read; the row's expiry is set when the session is saved.
 */
import session from 'express-session';
import connectSessionSequelize from 'connect-session-sequelize';
import type { Sequelize } from 'sequelize';
import { config } from './config';

const SequelizeStore = connectSessionSequelize(session.Store);

export function createSessionMiddleware(sequelize: Sequelize, { expiryTimer = true } = {}) {
  const maxAgeMs = config.session.maxAgeDays * 24 * 3600 * 1000;
  const store = new SequelizeStore({
    db: sequelize,
    table: 'WebSession',
    disableTouch: true,
    expiration: maxAgeMs,
    // Sweep expired rows hourly; tests turn the timer off.
    checkExpirationInterval: expiryTimer ? 3600 * 1000 : 0,
    extendDefaultFields: (defaults: { data: string; expires: Date }, data: { userId?: number }) => ({
      ...defaults,
      userId: data.userId ?? null,
    }),
  } as ConstructorParameters<typeof SequelizeStore>[0] & { disableTouch: boolean });
  if (!config.session.secret) throw new Error('SESSION_SECRET must be set in production');
  const middleware = session({
    name: 'pinwright.sid',
    secret: config.session.secret,
    store,
    resave: false,
    saveUninitialized: false,
    cookie: { httpOnly: true, sameSite: 'lax', secure: config.cookieSecure, maxAge: maxAgeMs },
  });
  return { middleware, store };
}

/**
 * Signs `userId` in on this request: a fresh session id first (defeats
 * session fixation), then the session saved before the answer is sent.
 * Used at sign-up, sign-in and when an invitation creates an account.
 */
export function startSession(req: Express.Request, userId: number): Promise<void> {
  return new Promise<void>((resolve, reject) => {
    req.session.regenerate((err) => {
      if (err) return reject(err);
      req.session.userId = userId;
      req.session.save((saveErr) => (saveErr ? reject(saveErr) : resolve()));
    });
  });
}
