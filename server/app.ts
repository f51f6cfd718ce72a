/**
 * Builds the Express app: security headers, JSON, sessions, CSRF guard, the
 * API, then the exported web app. No port is opened here (see index.ts), so
 * tests import it directly.
 */
import fs from 'node:fs';
import path from 'node:path';
import express from 'express';
import helmet from 'helmet';
import type { Sequelize } from 'sequelize';
import { config } from './config';
import { sequelize as defaultSequelize } from './db';
import { errorHandler, notFoundHandler } from './errors';
import { createRateLimits } from './middleware/rate-limits';
import { csrfGuard } from './middleware/csrf';
import { apiRoutes } from './routes';
import { createSessionMiddleware } from './session';

export type AppOptions = {
  sequelize?: Sequelize;
  /** The hourly sweep of expired sessions; tests turn it off. */
  sessionExpiryTimer?: boolean;
  /** Folder of the exported web app; defaults to dist/. */
  webDir?: string;
};

export function createApp(options: AppOptions = {}) {
  const sequelize = options.sequelize ?? defaultSequelize;
  const app = express();
  app.disable('x-powered-by');
  if (config.trustProxy) {
    const hops = Number(config.trustProxy);
    app.set('trust proxy', Number.isInteger(hops) ? hops : config.trustProxy === 'true' ? true : config.trustProxy);
  }
  app.use(
    helmet({
      contentSecurityPolicy: {
        directives: {
          defaultSrc: ["'self'"],
          scriptSrc: ["'self'"],
          // react-native-web injects its style sheet at run time.
          styleSrc: ["'self'", "'unsafe-inline'"],
          imgSrc: ["'self'", 'data:', 'blob:'],
          fontSrc: ["'self'", 'data:'],
          objectSrc: ["'none'"],
          frameAncestors: ["'none'"],
          upgradeInsecureRequests: config.cookieSecure ? [] : null,
        },
      },
    }),
  );

  const { middleware: sessionMiddleware, store } = createSessionMiddleware(sequelize, {
    expiryTimer: options.sessionExpiryTimer ?? true,
  });
  app.locals.sessionStore = store;
  app.locals.rateLimits = createRateLimits(); // one counter per limit for the whole app (sign-up is shared by two routes)

  app.use('/api', express.json({ limit: '1mb' }), sessionMiddleware, csrfGuard, apiRoutes(sequelize));
  app.use('/api', notFoundHandler);

  const webDir = options.webDir ?? config.webDir;
  const indexHtml = path.join(webDir, 'index.html');
  app.use(express.static(webDir, { index: false, maxAge: '1h' }));
  // Single-page app: every other GET gets index.html; the router takes it from there.
  app.get(/^(?!\/api\/).*/, (_req, res, next) => {
    if (!fs.existsSync(indexHtml)) return next();
    res.setHeader('Cache-Control', 'no-cache');
    res.sendFile(indexHtml);
  });
  app.use(errorHandler);
  return app;
}
