/**
 * Rate limits on accounts (OWASP Authentication Cheat Sheet, "Protect against
 * automated attacks"; numbers in server/config.ts, README "Configuration"):
 * password spraying (one client trying one password over many e-mails) is
 * stopped per address; guessing one e-mail from many addresses is stopped per
 * e-mail; one sign-up limit covers every route that makes an account;
 * invitations are counted per inviting account, not per address. And the
 * reset-link rule: a newer link ends the older ones.
 */
import request from 'supertest';
import { config } from '@/server/config';
import { waitForMail } from '@/server/mail/mail-store';
import { CSRF, closeDb, signedInAgent, testApp, uniqueEmail } from '../helpers/api';
import { bowBody } from './bow-fixtures';

jest.setTimeout(60_000);
afterAll(closeDb);

const limits = config.limits;

describe('sign-in', () => {
  it(`stops one address trying one password over many e-mails after ${limits.signInFailuresPerAddress} failures`, async () => {
    const app = testApp();
    const statuses: number[] = [];
    for (let i = 0; i <= limits.signInFailuresPerAddress; i += 1) {
      const res = await request(app)
        .post('/api/auth/sign-in')
        .set(CSRF)
        .send({ email: uniqueEmail(`spray${i}`), password: 'Autumn2026!' });
      statuses.push(res.status);
    }
    expect(statuses.slice(0, limits.signInFailuresPerAddress).every((status) => status === 401)).toBe(true);
    expect(statuses[limits.signInFailuresPerAddress]).toBe(429);
    const next = await request(app)
      .post('/api/auth/sign-in')
      .set(CSRF)
      .send({ email: uniqueEmail('spray-next'), password: 'Winter2026!' });
    expect(next.status).toBe(429);
    expect(next.body.error).toEqual({ code: 'rate_limited', message: 'Too many sign-in attempts. Wait 15 minutes and try again.' });
  });

  it('does not count successful sign-ins from a shared address against it', async () => {
    const app = testApp();
    const { email, password } = await signedInAgent(app);
    for (let i = 0; i < limits.signInFailuresPerAddress + 2; i += 1) {
      const res = await request(app).post('/api/auth/sign-in').set(CSRF).send({ email, password });
      if (res.status !== 200) throw new Error(`sign-in ${i}: ${res.status}`);
      if (i >= limits.signInPerAddressAndEmail - 1) break; // the per-address-and-e-mail limit counts every attempt
    }
    // Failures from the same address still have their full allowance.
    const failure = await request(app)
      .post('/api/auth/sign-in')
      .set(CSRF)
      .send({ email: uniqueEmail('other'), password: 'wrong password' });
    expect(failure.status).toBe(401);
  });

  it(`stops guessing one e-mail from many addresses after ${limits.signInFailuresPerEmail} failures`, async () => {
    const app = testApp();
    app.set('trust proxy', true); // each request claims its own client address, as behind a proxy
    const { email, password } = await signedInAgent(app);
    const statuses: number[] = [];
    for (let i = 0; i <= limits.signInFailuresPerEmail; i += 1) {
      const res = await request(app)
        .post('/api/auth/sign-in')
        .set(CSRF)
        .set('X-Forwarded-For', `198.51.100.${i + 1}`)
        .send({ email, password: `guess ${i}` });
      statuses.push(res.status);
    }
    expect(statuses.slice(0, limits.signInFailuresPerEmail).every((status) => status === 401)).toBe(true);
    expect(statuses[limits.signInFailuresPerEmail]).toBe(429);
    // Another e-mail from a fresh address is not affected.
    const other = await request(app)
      .post('/api/auth/sign-in')
      .set(CSRF)
      .set('X-Forwarded-For', '203.0.113.9')
      .send({ email: uniqueEmail('x'), password: 'whatever it is' });
    expect(other.status).toBe(401);
    expect(password).toBeTruthy();
  });
});

describe('sign-up', () => {
  it(`is one limit of ${limits.signUpsPerAddress} an hour over sign-up and accepting an invitation with a new account`, async () => {
    const app = testApp();
    // Half the allowance on each route (answers do not matter: every attempt counts).
    const half = Math.floor(limits.signUpsPerAddress / 2);
    for (let i = 0; i < half; i += 1) {
      const res = await request(app).post('/api/auth/sign-up').set(CSRF).send({ name: '', email: 'not-an-address', password: 'x' });
      expect(res.status).toBe(400);
    }
    for (let i = half; i < limits.signUpsPerAddress; i += 1) {
      const res = await request(app).post('/api/invites/accept-new').set(CSRF).send({ token: 'x', name: '', email: 'nope', password: 'x' });
      expect(res.status).toBe(400);
    }
    const overSignUp = await request(app)
      .post('/api/auth/sign-up')
      .set(CSRF)
      .send({ name: 'Ada Fenn', email: uniqueEmail('late'), password: 'a long password here' });
    expect(overSignUp.status).toBe(429);
    expect(overSignUp.body.error).toEqual({
      code: 'rate_limited',
      message: 'Too many new accounts from this address. Try again in an hour.',
    });
    const overInvite = await request(app)
      .post('/api/invites/accept-new')
      .set(CSRF)
      .send({ token: 'x', name: 'Ada Fenn', email: uniqueEmail('late'), password: 'a long password here' });
    expect(overInvite.status).toBe(429);
  });
});

describe('invitations', () => {
  it(`are limited to ${limits.invitesPerAccount} an hour per inviting account, not per address`, async () => {
    const app = testApp();
    const busy = await signedInAgent(app);
    const quiet = await signedInAgent(app); // same client address as `busy`
    const bowOf = async (agent: typeof busy.agent) => (await agent.post('/api/bows').set(CSRF).send(bowBody())).body.bow.id as number;
    const busyBow = await bowOf(busy.agent);
    const quietBow = await bowOf(quiet.agent);
    for (let i = 0; i < limits.invitesPerAccount; i += 1) {
      const res = await busy.agent
        .post(`/api/bows/${busyBow}/shares`)
        .set(CSRF)
        .send({ email: uniqueEmail(`tech${i}`) });
      expect(res.status).toBe(201);
    }
    const over = await busy.agent
      .post(`/api/bows/${busyBow}/shares`)
      .set(CSRF)
      .send({ email: uniqueEmail('tech-over') });
    expect(over.status).toBe(429);
    expect(over.body.error.code).toBe('rate_limited');
    expect(over.body.error.message).toMatch(new RegExp(`${limits.invitesPerAccount} invitations in the last hour`));
    // Another account on the same address sends its first invitation.
    const first = await quiet.agent
      .post(`/api/bows/${quietBow}/shares`)
      .set(CSRF)
      .send({ email: uniqueEmail('tech-first') });
    expect(first.status).toBe(201);
  });
});

describe('reset links', () => {
  const tokenIn = (text: string | null) => /\/reset-password\?token=([A-Za-z0-9_-]{43})/.exec(text ?? '')?.[1];

  it('a new link ends the older one', async () => {
    const app = testApp();
    const { email } = await signedInAgent(app);
    const ask = async () => {
      const since = new Date();
      expect((await request(app).post('/api/password/forgot').set(CSRF).send({ email })).status).toBe(202);
      const mail = await waitForMail(config.mailDir, email, { since, match: (m) => /reset/i.test(m.subject) });
      return tokenIn(mail.text)!;
    };
    const older = await ask();
    await new Promise((resolve) => setTimeout(resolve, 20)); // the second message is told apart by its time
    const newer = await ask();
    expect(newer).not.toBe(older);
    const refused = await request(app).post('/api/password/reset').set(CSRF).send({ token: older, password: 'a brand new passphrase' });
    expect(refused.status).toBe(410);
    expect(refused.body.error.code).toBe('link_expired');
    const done = await request(app).post('/api/password/reset').set(CSRF).send({ token: newer, password: 'a brand new passphrase' });
    expect(done.status).toBe(200);
  });
});
