import request from 'supertest';
import { CSRF, closeDb, signedInAgent, testApp, uniqueEmail } from '../helpers/api';
import { User } from '@/server/models';

const app = testApp();
afterAll(closeDb);

describe('sign-up', () => {
  it('lists each field problem in plain words and writes nothing', async () => {
    const email = uniqueEmail('bad');
    const res = await request(app)
      .post('/api/auth/sign-up')
      .set(CSRF)
      .send({ name: '', email: email.replace('@', ''), password: 'short' });
    expect(res.status).toBe(400);
    expect(res.body.error.code).toBe('validation_failed');
    expect(res.body.error.fields).toEqual({
      name: 'Enter your name',
      email: 'Enter a valid e-mail address',
      password: 'Password must be at least 10 characters',
    });
    expect(await User.count({ where: { email: email.replace('@', '') } })).toBe(0);
  });

  it('creates an archer, signs them in, and never returns the password hash', async () => {
    const { agent, email, user } = await signedInAgent(app, { name: 'Ilse Brannock' });
    expect(user).toMatchObject({ name: 'Ilse Brannock', email, role: 'archer', distanceUnit: 'yd', lengthUnit: 'mm' });
    expect(JSON.stringify(user)).not.toMatch(/hash|\$2[aby]\$/);
    const me = await agent.get('/api/me');
    expect(me.status).toBe(200);
    expect(me.body.user.email).toBe(email);
    const stored = await User.findOne({ where: { email } });
    expect(stored?.passwordHash).toMatch(/^\$2[aby]\$12\$/); // bcrypt, cost 12
  });

  it('refuses a duplicate e-mail, in any letter case', async () => {
    const { email } = await signedInAgent(app);
    const res = await request(app)
      .post('/api/auth/sign-up')
      .set(CSRF)
      .send({ name: 'Again', email: email.toUpperCase(), password: 'another long one' });
    expect(res.status).toBe(409);
    expect(res.body.error.fields.email).toMatch(/already exists/);
    expect(await User.count({ where: { email } })).toBe(1);
  });
});

describe('sign-in and sign-out', () => {
  it('refuses a wrong password with one plain message', async () => {
    const { email } = await signedInAgent(app);
    const res = await request(app).post('/api/auth/sign-in').set(CSRF).send({ email, password: 'not the password' });
    expect(res.status).toBe(401);
    expect(res.body).toEqual({ error: { code: 'unauthorized', message: 'E-mail or password is wrong.' } });
    const unknown = await request(app)
      .post('/api/auth/sign-in')
      .set(CSRF)
      .send({ email: uniqueEmail('nobody'), password: 'whatever123' });
    expect(unknown.status).toBe(401);
    expect(unknown.body).toEqual(res.body);
  });

  it('signs in with the right password and signs out', async () => {
    const { email, password } = await signedInAgent(app);
    const agent = request.agent(app);
    expect((await agent.get('/api/me')).status).toBe(401);
    const res = await agent
      .post('/api/auth/sign-in')
      .set(CSRF)
      .send({ email: ` ${email.toUpperCase()} `, password });
    expect(res.status).toBe(200);
    expect(res.headers['set-cookie'][0]).toMatch(/pinwright\.sid=.*HttpOnly.*SameSite=Lax/i);
    expect((await agent.get('/api/me')).status).toBe(200);
    expect((await agent.post('/api/auth/sign-out').set(CSRF)).status).toBe(204);
    const after = await agent.get('/api/me');
    expect(after.status).toBe(401);
    expect(after.body.error.code).toBe('unauthorized');
  });

  it('rate-limits repeated sign-in attempts for one e-mail', async () => {
    const limited = testApp();
    const { email } = await signedInAgent(limited);
    const statuses: number[] = [];
    for (let i = 0; i < 11; i += 1) {
      const res = await request(limited)
        .post('/api/auth/sign-in')
        .set(CSRF)
        .send({ email, password: `wrong guess ${i}` });
      statuses.push(res.status);
    }
    expect(statuses.slice(0, 10).every((s) => s === 401)).toBe(true);
    expect(statuses[10]).toBe(429);
    const res = await request(limited).post('/api/auth/sign-in').set(CSRF).send({ email, password: 'wrong again!' });
    expect(res.body.error).toEqual({ code: 'rate_limited', message: expect.stringMatching(/Too many sign-in attempts/) });
  });

  it('will not let a disabled account sign in, and ends its current sign-in session', async () => {
    const { agent, email, password } = await signedInAgent(app);
    await User.update({ disabled: true }, { where: { email } });
    expect((await agent.get('/api/me')).status).toBe(401);
    const res = await request(app).post('/api/auth/sign-in').set(CSRF).send({ email, password });
    expect(res.status).toBe(403);
    expect(res.body.error.code).toBe('disabled');
  });
});

describe('guards', () => {
  it('answers 401 without a sign-in session', async () => {
    const res = await request(app).get('/api/me');
    expect(res.status).toBe(401);
    expect(res.body).toEqual({ error: { code: 'unauthorized', message: 'Sign in to continue.' } });
  });

  it('answers 403 for the wrong role', async () => {
    const { agent } = await signedInAgent(app);
    const res = await agent.get('/api/admin/accounts');
    expect(res.status).toBe(403);
    expect(res.body.error.code).toBe('forbidden');
  });

  it('refuses a state-changing request without the app header (cross-site form post)', async () => {
    const email = uniqueEmail('csrf');
    const form = await request(app)
      .post('/api/auth/sign-up')
      .type('form')
      .send({ name: 'Cross Site', email, password: 'long enough password' });
    expect(form.status).toBe(403);
    expect(form.body.error.code).toBe('csrf');
    const otherOrigin = await request(app)
      .post('/api/auth/sign-up')
      .set(CSRF)
      .set('Origin', 'https://evil.example')
      .send({ name: 'Cross Site', email, password: 'long enough password' });
    expect(otherOrigin.status).toBe(403);
    expect(await User.count({ where: { email } })).toBe(0);
  });
});

describe('error shape', () => {
  it('gives JSON 404s for unknown API paths', async () => {
    const res = await request(app).get('/api/no-such-thing');
    expect(res.status).toBe(404);
    expect(res.body.error).toEqual({ code: 'not_found', message: 'No such API path: GET /api/no-such-thing' });
  });

  it('reports malformed JSON plainly, without a stack trace', async () => {
    const res = await request(app).post('/api/auth/sign-in').set(CSRF).set('Content-Type', 'application/json').send('{"email": ');
    expect(res.status).toBe(400);
    expect(res.body).toEqual({ error: { code: 'bad_json', message: 'The request body is not valid JSON.' } });
    expect(res.text).not.toMatch(/at .*\.ts:\d+/);
  });
});

describe('own profile', () => {
  it('changes name and preferred units, and refuses anything else', async () => {
    const { agent } = await signedInAgent(app);
    const res = await agent.patch('/api/me').set(CSRF).send({ distanceUnit: 'm', lengthUnit: 'in' });
    expect(res.status).toBe(200);
    expect(res.body.user).toMatchObject({ distanceUnit: 'm', lengthUnit: 'in' });
    expect((await agent.get('/api/me')).body.user.distanceUnit).toBe('m');

    const bad = await agent.patch('/api/me').set(CSRF).send({ distanceUnit: 'furlong' });
    expect(bad.status).toBe(400);
    expect(Object.keys(bad.body.error.fields)).toEqual(['distanceUnit']);
    const sneaky = await agent.patch('/api/me').set(CSRF).send({ role: 'admin' });
    expect(sneaky.status).toBe(400);
    expect((await agent.get('/api/me')).body.user.role).toBe('archer');
  });
});
