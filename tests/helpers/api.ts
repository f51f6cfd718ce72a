/**
 * API test helpers: the real app over the real MariaDB database that
 * `npm test` created for this run (DB_NAME), never a mock.
 */
import request from 'supertest';
import type { Express } from 'express';
import { createApp } from '@/server/app';
import { closeDatabase } from '@/server/db';

export const CSRF = { 'X-Pinwright-Csrf': '1' };

export function testApp(): Express {
  return createApp({ sessionExpiryTimer: false });
}

let counter = 0;
/** An e-mail nobody else in this run uses (test files run in parallel on one database). */
export function uniqueEmail(tag = 'user'): string {
  counter += 1;
  return `${tag}.${process.pid}.${Date.now().toString(36)}.${counter}@example.test`;
}

/** Sign up a new account and return an agent that carries its session cookie. */
export async function signedInAgent(app: Express, overrides: { name?: string; email?: string; password?: string } = {}) {
  const agent = request.agent(app);
  const email = overrides.email ?? uniqueEmail();
  const password = overrides.password ?? 'correct horse battery';
  const res = await agent
    .post('/api/auth/sign-up')
    .set(CSRF)
    .send({ name: overrides.name ?? 'Test Archer', email, password });
  if (res.status !== 201) throw new Error(`sign-up failed: ${res.status} ${JSON.stringify(res.body)}`);
  return { agent, email, password, user: res.body.user as { id: number; role: string } };
}

export async function closeDb() {
  await closeDatabase();
}
