/**
 * Builds the Express app: security headers, JSON, sessions, CSRF guard, the
 * API, then the exported web app. No port is opened here (see index.ts), so
 * tests import it directly.
 */
import compression from 'compression';
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
import { webStatic } from './web-static';

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

  // API responses: brotli or gzip as the client accepts (compression 1.8; small bodies stay plain).
  app.use('/api', compression());
  app.use('/api', express.json({ limit: '1mb' }), sessionMiddleware, csrfGuard, apiRoutes(sequelize));
  app.use('/api', notFoundHandler);

  // The exported web app: precompressed files, long-lived hashed assets, index.html for app routes.
  app.use(webStatic(options.webDir ?? config.webDir));
  app.use(errorHandler);
  return app;
}
