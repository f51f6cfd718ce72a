/**
 * Who is acting in the current request, for the audit trail. A middleware
 * opens an AsyncLocalStorage scope per API request (Node's async context
 * tracking: the store follows every await and callback started inside it),
 * and the model hooks in audit-service.ts read the signed-in user from it.
 * Outside a request (seed, command line) there is no actor and nothing is
 * recorded by the hooks.
 *
 * Example: auditContext(sequelize, installHooks) → the middleware (see auditTrail in audit-service.ts)
 */
import { AsyncLocalStorage } from 'node:async_hooks';
import type { Request, RequestHandler } from 'express';
import type { Sequelize } from 'sequelize';
import type { User } from '@/server/models/user'; // not '@/server/models', whose hooks import this module

type Scope = { req: Request };

const storage = new AsyncLocalStorage<Scope>();
const installed = new WeakSet<Sequelize>();

/** The signed-in user of the current request (set by requireUser), or null. */
export function currentActor(): User | null {
  return storage.getStore()?.req.user ?? null;
}

/** The middleware that opens the scope; installs the audit hooks on `sequelize` once. */
export function auditContext(sequelize: Sequelize, install: (sequelize: Sequelize) => void): RequestHandler {
  if (!installed.has(sequelize)) {
    installed.add(sequelize);
    install(sequelize);
  }
  return (req, _res, next) => storage.run({ req }, next);
}
