/**
 * The administrator's work: the accounts list with search, role changes,
 * disabling and enabling accounts, and the audit log.
 */
import request from 'supertest';
import { User } from '@/server/models';
import { CSRF, closeDb, signedInAgent, testApp, uniqueEmail } from '../helpers/api';

const app = testApp();
// Many requests per test on a shared 2-core machine (bcrypt at cost 12, PDF drawing).
jest.setTimeout(30_000);
afterAll(closeDb);

async function adminAgent() {
  const admin = await signedInAgent(app, { name: 'Rowan Admin' });
  await User.update({ role: 'admin' }, { where: { id: admin.user.id } });
  return admin;
}

describe('who may use the admin API', () => {
  it('refuses archers and technicians with 403, and signed-out visitors with 401', async () => {
    const archer = await signedInAgent(app);
    const tech = await signedInAgent(app);
    await User.update({ role: 'tech' }, { where: { id: tech.user.id } });
    for (const path of ['/api/admin/accounts', '/api/admin/audit']) {
      expect((await archer.agent.get(path)).status).toBe(403);
      expect((await tech.agent.get(path)).status).toBe(403);
      expect((await request(app).get(path)).status).toBe(401);
    }
    const patch = await tech.agent.patch(`/api/admin/accounts/${archer.user.id}`).set(CSRF).send({ role: 'admin' });
    expect(patch.status).toBe(403);
    expect((await User.findByPk(archer.user.id))?.role).toBe('archer');
  });
});

describe('accounts list', () => {
  it('searches name and e-mail, filters by role, and never shows a password hash', async () => {
    const { agent } = await adminAgent();
    const tag = `zephyrine${Date.now().toString(36)}`;
    const byName = await signedInAgent(app, { name: `Ada ${tag}` });
    const byEmail = await signedInAgent(app, { email: uniqueEmail(tag) });
    await User.update({ role: 'tech' }, { where: { id: byEmail.user.id } });

    const res = await agent.get('/api/admin/accounts').query({ q: tag });
    expect(res.status).toBe(200);
    expect(res.body.total).toBe(2);
    expect(res.body.accounts.map((a: { id: number }) => a.id).sort()).toEqual([byName.user.id, byEmail.user.id].sort());
    expect(JSON.stringify(res.body)).not.toMatch(/passwordHash|\$2[aby]\$/);

    const techs = await agent.get('/api/admin/accounts').query({ q: tag, role: 'tech' });
    expect(techs.body.accounts).toEqual([expect.objectContaining({ id: byEmail.user.id, role: 'tech', disabled: false })]);

    // LIKE wildcards in the search are taken literally.
    const wildcard = await agent.get('/api/admin/accounts').query({ q: '%' });
    expect(wildcard.body.accounts.every((a: { name: string; email: string }) => `${a.name}${a.email}`.includes('%'))).toBe(true);

    const bad = await agent.get('/api/admin/accounts').query({ role: 'wizard' });
    expect(bad.status).toBe(400);
    expect(bad.body.error.fields['query.role']).toBe('Role must be archer, tech or admin');
  });
});

describe('changing roles and disabling', () => {
  it('changes a role at once and records it in the audit log', async () => {
    const admin = await adminAgent();
    const person = await signedInAgent(app, { name: 'Per Holloway' });
    const res = await admin.agent.patch(`/api/admin/accounts/${person.user.id}`).set(CSRF).send({ role: 'tech' });
    expect(res.status).toBe(200);
    expect(res.body.account).toMatchObject({ id: person.user.id, role: 'tech', disabled: false });
    expect((await person.agent.get('/api/me')).body.user.role).toBe('tech');

    const log = await admin.agent.get('/api/admin/audit');
    expect(log.status).toBe(200);
    const entry = log.body.entries.find(
      (e: { recordId: number; action: string }) => e.recordId === person.user.id && e.action === 'role-changed',
    );
    expect(entry).toMatchObject({
      actor: { id: admin.user.id, name: 'Rowan Admin', role: 'admin' },
      recordType: 'account',
      bowId: null,
      summary: expect.stringContaining('from archer to tech'),
    });
  });

  it('disabling ends the account’s sign-in sessions and bars sign-in; enabling lets it back', async () => {
    const admin = await adminAgent();
    const person = await signedInAgent(app);
    const disabled = await admin.agent.patch(`/api/admin/accounts/${person.user.id}`).set(CSRF).send({ disabled: true });
    expect(disabled.status).toBe(200);
    expect(disabled.body.account.disabled).toBe(true);
    expect((await person.agent.get('/api/me')).status).toBe(401);
    const signIn = await request(app).post('/api/auth/sign-in').set(CSRF).send({ email: person.email, password: person.password });
    expect(signIn.status).toBe(403);
    expect(signIn.body.error.code).toBe('disabled');

    const enabled = await admin.agent.patch(`/api/admin/accounts/${person.user.id}`).set(CSRF).send({ disabled: false });
    expect(enabled.body.account.disabled).toBe(false);
    expect((await request(app).post('/api/auth/sign-in').set(CSRF).send({ email: person.email, password: person.password })).status).toBe(
      200,
    );

    const log = await admin.agent.get('/api/admin/audit');
    // Entries about this account (a record of another type may share its id number).
    const actions = log.body.entries
      .filter((e: { recordId: number; recordType: string }) => e.recordType === 'account' && e.recordId === person.user.id)
      .map((e: { action: string }) => e.action);
    // Newest first.
    expect(actions).toEqual(['enabled', 'disabled']);
  });

  it('will not let an admin disable themself or drop their own admin role', async () => {
    const admin = await adminAgent();
    for (const body of [{ disabled: true }, { role: 'archer' }]) {
      const res = await admin.agent.patch(`/api/admin/accounts/${admin.user.id}`).set(CSRF).send(body);
      expect(res.status).toBe(400);
    }
    expect((await User.findByPk(admin.user.id))?.role).toBe('admin');
  });

  it('answers 404 for an unknown account and 400 for an empty or wrong change', async () => {
    const { agent } = await adminAgent();
    expect((await agent.patch('/api/admin/accounts/999999999').set(CSRF).send({ role: 'tech' })).status).toBe(404);
    const empty = await agent.patch('/api/admin/accounts/1').set(CSRF).send({});
    expect(empty.status).toBe(400);
    const wrong = await agent.patch('/api/admin/accounts/1').set(CSRF).send({ role: 'owner' });
    expect(wrong.status).toBe(400);
  });
});
