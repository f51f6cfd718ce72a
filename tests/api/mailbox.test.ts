/**
 * The development mailbox (GET /api/dev/mail) reads like a mail program:
 * signed out, nothing (401); signed in, only the mail sent to one's own
 * address; an administrator reads everything; only an administrator empties it.
 */
import request from 'supertest';
import { config } from '@/server/config';
import { listStoredMail, waitForMail } from '@/server/mail/mail-store';
import { User } from '@/server/models';
import { CSRF, closeDb, signedInAgent, testApp } from '../helpers/api';

const app = testApp();
jest.setTimeout(30_000);
afterAll(closeDb);

type Signed = Awaited<ReturnType<typeof signedInAgent>>;
let alice: Signed;
let bruno: Signed;
let admin: Signed;
let aliceMail: string;
let brunoMail: string;

async function resetMailFor(email: string) {
  const since = new Date();
  expect((await request(app).post('/api/password/forgot').set(CSRF).send({ email })).status).toBe(202);
  return (await waitForMail(config.mailDir, email, { since, match: (m) => /reset/i.test(m.subject) })).id;
}

beforeAll(async () => {
  alice = await signedInAgent(app, { name: 'Alice Wren' });
  bruno = await signedInAgent(app, { name: 'Bruno Saltmarsh' });
  admin = await signedInAgent(app, { name: 'Mailbox Admin' });
  await User.update({ role: 'admin' }, { where: { id: admin.user.id } });
  aliceMail = await resetMailFor(alice.email);
  brunoMail = await resetMailFor(bruno.email);
});

it('answers 401 to anyone signed out, for every reader path', async () => {
  for (const path of ['/api/dev/mail', `/api/dev/mail/${aliceMail}`, `/api/dev/mail/${aliceMail}/attachments/0`]) {
    const res = await request(app).get(path);
    expect(res.status).toBe(401);
    expect(res.body.error.code).toBe('unauthorized');
  }
  expect((await request(app).delete('/api/dev/mail').set(CSRF)).status).toBe(401);
});

it('shows a signed-in account only the mail sent to it', async () => {
  const list = await alice.agent.get('/api/dev/mail');
  expect(list.status).toBe(200);
  const ids = list.body.messages.map((m: { id: string }) => m.id);
  expect(ids).toContain(aliceMail);
  expect(ids).not.toContain(brunoMail);
  expect(list.body.messages.every((m: { to: string[] }) => m.to.includes(alice.email))).toBe(true);
  // Asking for someone else's address gives nothing; their message is "not found".
  expect((await alice.agent.get('/api/dev/mail').query({ to: bruno.email })).body.messages).toEqual([]);
  expect((await alice.agent.get(`/api/dev/mail/${brunoMail}`)).status).toBe(404);
  expect((await alice.agent.get(`/api/dev/mail/${brunoMail}/attachments/0`)).status).toBe(404);
  const own = await alice.agent.get(`/api/dev/mail/${aliceMail}`);
  expect(own.status).toBe(200);
  expect(own.body.message.links[0].appPath).toMatch(/^\/reset-password\?token=/);
});

it('shows an administrator every message', async () => {
  const list = await admin.agent.get('/api/dev/mail');
  const ids = list.body.messages.map((m: { id: string }) => m.id);
  expect(ids).toEqual(expect.arrayContaining([aliceMail, brunoMail]));
  expect((await admin.agent.get(`/api/dev/mail/${brunoMail}`)).status).toBe(200);
  const filtered = await admin.agent.get('/api/dev/mail').query({ to: bruno.email });
  expect(filtered.body.messages.map((m: { id: string }) => m.id)).toEqual([brunoMail]);
});

it('lets only an administrator empty the mailbox', async () => {
  const refused = await alice.agent.delete('/api/dev/mail').set(CSRF);
  expect(refused.status).toBe(403);
  expect(listStoredMail(config.mailDir).some((m) => m.id === aliceMail)).toBe(true);
  // The mail folder is shared by the test files running beside this one, so the
  // administrator's delete is checked on a scratch folder of its own.
  const saved = config.mailDir;
  const fs = await import('node:fs');
  const os = await import('node:os');
  const path = await import('node:path');
  const scratch = fs.mkdtempSync(path.join(os.tmpdir(), 'pinwright-mailbox-'));
  fs.copyFileSync(path.join(saved, `${aliceMail}.json`), path.join(scratch, `${aliceMail}.json`));
  (config as { mailDir: string }).mailDir = scratch;
  try {
    const emptied = await admin.agent.delete('/api/dev/mail').set(CSRF);
    expect(emptied.status).toBe(200);
    expect(emptied.body).toEqual({ removed: 1 });
    expect(fs.readdirSync(scratch).filter((name) => name.endsWith('.json'))).toEqual([]);
  } finally {
    (config as { mailDir: string }).mailDir = saved;
    fs.rmSync(scratch, { recursive: true, force: true });
  }
});
