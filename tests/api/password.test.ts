/**
 * Password reset by e-mail, through the real fake SMTP service: the test reads
 * the message the app sent from the mailbox folder and follows its link.
 * Expectations follow the OWASP Forgot Password Cheat Sheet (same answer for
 * known and unknown addresses; random single-use token; short expiry; token
 * stored hashed; sessions ended on reset).
 */
import crypto from 'node:crypto';
import request from 'supertest';
import { config } from '@/server/config';
import { listStoredMail, waitForMail } from '@/server/mail/mail-store';
import { Token, User } from '@/server/models';
import { CSRF, closeDb, signedInAgent, testApp, uniqueEmail } from '../helpers/api';

const app = testApp();
// Many requests per test on a shared 2-core machine (bcrypt at cost 12, PDF drawing).
jest.setTimeout(30_000);
afterAll(closeDb);

const tokenIn = (text: string | null) => /\/reset-password\?token=([A-Za-z0-9_-]{43})/.exec(text ?? '')?.[1];

async function askForReset(email: string) {
  const since = new Date();
  const res = await request(app).post('/api/password/forgot').set(CSRF).send({ email });
  return { res, since };
}

async function resetLinkFor(email: string) {
  const { res, since } = await askForReset(email);
  expect(res.status).toBe(202);
  const mail = await waitForMail(config.mailDir, email, { since, match: (m) => /reset/i.test(m.subject) });
  const token = tokenIn(mail.text);
  expect(token).toBeDefined();
  return { mail, token: token! };
}

describe('asking for a reset link', () => {
  it('gives the same answer for an address with an account and one without', async () => {
    const { email } = await signedInAgent(app);
    const known = await askForReset(email);
    const unknown = await askForReset(uniqueEmail('nobody'));
    expect(known.res.status).toBe(202);
    expect(unknown.res.status).toBe(known.res.status);
    expect(unknown.res.body).toEqual(known.res.body);
    expect(known.res.body.message).toMatch(/If an account uses that address/);
  });

  it('e-mails a link whose token is stored only as its SHA-256, valid for one hour', async () => {
    const { email, user } = await signedInAgent(app, { name: 'Orla Fenwick' });
    const before = Date.now();
    const { mail, token } = await resetLinkFor(email);
    expect(mail.envelopeTo).toEqual([email]);
    expect(mail.subject).toBe('Reset your Pinwright password');
    expect(mail.text).toContain('Hello Orla Fenwick');
    expect(mail.html).toContain('Choose a new password');
    expect(mail.text).toContain(`${config.publicUrl}/reset-password?token=${token}`);

    const rows = await Token.findAll({ where: { userId: user.id, purpose: 'password-reset' } });
    expect(rows).toHaveLength(1);
    expect(rows[0].tokenHash).toBe(crypto.createHash('sha256').update(token).digest('hex'));
    expect(JSON.stringify(rows[0].toJSON())).not.toContain(token);
    const validMs = rows[0].expiresAt.getTime() - before;
    // One hour, allowing for the time the request itself took.
    expect(validMs).toBeGreaterThan(3600_000 - 60_000);
    expect(validMs).toBeLessThanOrEqual(3600_000 + 1000);
  });

  it('sends nothing to a disabled account, and says the same', async () => {
    const { email } = await signedInAgent(app);
    await User.update({ disabled: true }, { where: { email } });
    const { res } = await askForReset(email);
    expect(res.status).toBe(202);
    await new Promise((resolve) => setTimeout(resolve, 1000));
    expect(listStoredMail(config.mailDir, { to: email })).toHaveLength(0);
  });

  it('checks the address like sign-up does', async () => {
    const res = await request(app).post('/api/password/forgot').set(CSRF).send({ email: 'not an address' });
    expect(res.status).toBe(400);
    expect(res.body.error.fields).toEqual({ email: 'Enter a valid e-mail address' });
  });
});

describe('choosing a new password from the link', () => {
  it('sets the password, ends every session of the account, and works only once', async () => {
    const { agent, email, password } = await signedInAgent(app);
    const { token } = await resetLinkFor(email);
    expect((await agent.get('/api/me')).status).toBe(200);

    const res = await request(app).post('/api/password/reset').set(CSRF).send({ token, password: 'a brand new passphrase' });
    expect(res.status).toBe(200);
    expect(res.body.message).toMatch(/signed out everywhere/);

    // The session that was open before the reset is gone.
    expect((await agent.get('/api/me')).status).toBe(401);
    const oldPassword = await request(app).post('/api/auth/sign-in').set(CSRF).send({ email, password });
    expect(oldPassword.status).toBe(401);
    const newPassword = await request(app).post('/api/auth/sign-in').set(CSRF).send({ email, password: 'a brand new passphrase' });
    expect(newPassword.status).toBe(200);

    const again = await request(app).post('/api/password/reset').set(CSRF).send({ token, password: 'yet another passphrase' });
    expect(again.status).toBe(410);
    expect(again.body.error.code).toBe('link_used');
    expect(again.body.error.message).toMatch(/already been used/);
  });

  it('refuses an expired link and leaves the password as it was', async () => {
    const { email, password } = await signedInAgent(app);
    const { token } = await resetLinkFor(email);
    const hash = crypto.createHash('sha256').update(token).digest('hex');
    await Token.update({ expiresAt: new Date(Date.now() - 1000) }, { where: { tokenHash: hash } });

    const res = await request(app).post('/api/password/reset').set(CSRF).send({ token, password: 'too late for this one' });
    expect(res.status).toBe(410);
    expect(res.body.error).toEqual({ code: 'link_expired', message: expect.stringMatching(/expired/) });
    expect((await request(app).post('/api/auth/sign-in').set(CSRF).send({ email, password })).status).toBe(200);
  });

  it('retires the other links of the account once one is used', async () => {
    const { email } = await signedInAgent(app);
    const first = await resetLinkFor(email);
    const second = await resetLinkFor(email);
    expect(second.token).not.toBe(first.token);
    expect(
      (await request(app).post('/api/password/reset').set(CSRF).send({ token: second.token, password: 'the second link wins' })).status,
    ).toBe(200);
    const stale = await request(app).post('/api/password/reset').set(CSRF).send({ token: first.token, password: 'the first link is dead' });
    expect(stale.status).toBe(410);
  });

  it('refuses a made-up token and a short password in plain words', async () => {
    const madeUp = crypto.randomBytes(32).toString('base64url');
    const res = await request(app).post('/api/password/reset').set(CSRF).send({ token: madeUp, password: 'long enough password' });
    expect(res.status).toBe(404);
    expect(res.body.error.code).toBe('link_unknown');

    const short = await request(app).post('/api/password/reset').set(CSRF).send({ token: madeUp, password: 'short' });
    expect(short.status).toBe(400);
    expect(short.body.error.fields).toEqual({ password: 'Password must be at least 10 characters' });

    const broken = await request(app).post('/api/password/reset').set(CSRF).send({ token: 'abc', password: 'long enough password' });
    expect(broken.status).toBe(400);
    expect(broken.body.error.fields.token).toMatch(/not complete/);
  });
});

describe('the development mail reader', () => {
  it('lists what was sent to an address and gives the links that open in this app', async () => {
    // Read as the addressee would: signed in (tests/api/mailbox.test.ts has the rules).
    const { agent, email } = await signedInAgent(app);
    const { mail, token } = await resetLinkFor(email);
    const list = await agent.get('/api/dev/mail').query({ to: email.toUpperCase() });
    expect(list.status).toBe(200);
    expect(list.body.messages).toEqual([
      expect.objectContaining({ id: mail.id, to: [email], subject: 'Reset your Pinwright password', attachmentCount: 0 }),
    ]);
    const one = await agent.get(`/api/dev/mail/${mail.id}`);
    expect(one.body.message.links).toEqual([
      { href: `${config.publicUrl}/reset-password?token=${token}`, appPath: `/reset-password?token=${token}` },
    ]);
    expect((await agent.get('/api/dev/mail/..%2F..%2Fetc%2Fpasswd')).status).toBe(400);
  });

  it('is not there in production', async () => {
    const saved = { NODE_ENV: process.env.NODE_ENV, SESSION_SECRET: process.env.SESSION_SECRET };
    let production: { app: import('express').Express; close: () => Promise<void> } | undefined;
    try {
      process.env.NODE_ENV = 'production';
      process.env.SESSION_SECRET = 'a production secret for this test only';
      jest.isolateModules(() => {
        // A fresh module registry: config, database and app built as production would build them.
        // eslint-disable-next-line @typescript-eslint/no-require-imports -- jest.isolateModules needs a require inside the callback
        const { createApp } = require('@/server/app');
        // eslint-disable-next-line @typescript-eslint/no-require-imports -- as above
        const { closeDatabase } = require('@/server/db');
        production = { app: createApp({ sessionExpiryTimer: false }), close: () => closeDatabase() };
      });
    } finally {
      process.env.NODE_ENV = saved.NODE_ENV;
      process.env.SESSION_SECRET = saved.SESSION_SECRET;
    }
    const res = await request(production!.app).get('/api/dev/mail');
    expect(res.status).toBe(404);
    expect(res.body.error.message).toBe('No such API path: GET /api/dev/mail');
    await production!.close();
  });
});
