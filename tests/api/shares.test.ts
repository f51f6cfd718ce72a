/**
 * Sharing a bow with a technician, end to end through the fake SMTP service:
 * the invitation is read from the mailbox and its link followed. Then what a
 * technician may and may not do on a shared bow, the audit log of their
 * writes, and revoking (refused on the very next request).
 */
import crypto from 'node:crypto';
import request from 'supertest';
import { config } from '@/server/config';
import { waitForMail } from '@/server/mail/mail-store';
import { AuditEntry, Bow, SightInMark, Share, SightIn, Token, User } from '@/server/models';
import { seedBows } from '@/server/seed/bows';
import { seedSharingStep } from '@/server/seed/sharing';
import { CSRF, closeDb, signedInAgent, testApp, uniqueEmail } from '../helpers/api';
import { bowWithSightIn, knownMarks, type Agent } from './bow-fixtures';

const app = testApp();
// Many requests per test on a shared 2-core machine (bcrypt at cost 12, PDF drawing).
jest.setTimeout(30_000);
afterAll(closeDb);

const tokenIn = (text: string | null) => /\/invite\?token=([A-Za-z0-9_-]{43})/.exec(text ?? '')?.[1];
const sha256 = (text: string) => crypto.createHash('sha256').update(text).digest('hex');

async function technician(name = 'Test Technician') {
  const tech = await signedInAgent(app, { name });
  await User.update({ role: 'tech' }, { where: { id: tech.user.id } });
  return tech;
}

/** Archer invites `email` to the bow; returns the API answer and the token read from the e-mail. */
async function invite(archer: Agent, bowId: number, email: string) {
  const since = new Date();
  const res = await archer.post(`/api/bows/${bowId}/shares`).set(CSRF).send({ email });
  expect(res.status).toBe(201);
  const mail = await waitForMail(config.mailDir, email, { since, match: (m) => /shared a bow/.test(m.subject) });
  const token = tokenIn(mail.text);
  expect(token).toBeDefined();
  return { share: res.body.share, mail, token: token! };
}

/** An archer with a bow, build and sight-in; a technician with an accepted share of that bow. */
async function sharedBow(archerName = 'Marit Test', techName = 'Desmond Test') {
  const archer = await signedInAgent(app, { name: archerName });
  const made = await bowWithSightIn(archer.agent, [20, 40, 60], {}, { nickname: `Ridge ${archerName}` });
  const tech = await technician(techName);
  const { share, token } = await invite(archer.agent, made.bow.id, tech.email);
  const accepted = await tech.agent.post('/api/invites/accept').set(CSRF).send({ token });
  expect(accepted.status).toBe(200);
  return { archer, tech, share: accepted.body.share ?? share, token, ...made };
}

describe('the invitation', () => {
  it('e-mails a single-use link, stored only as its SHA-256, that a technician accepts', async () => {
    const archer = await signedInAgent(app, { name: 'Ilse Brannock' });
    const made = await bowWithSightIn(archer.agent, [20, 40, 60], {}, { nickname: 'Cedar Hollow slider' });
    const tech = await technician('Joss Harrow');

    const since = Date.now();
    const { share, mail, token } = await invite(archer.agent, made.bow.id, tech.email);
    expect(share).toMatchObject({ bowId: made.bow.id, invitedEmail: tech.email, state: 'invited', tech: null });
    // Seven days, allowing for the time the request took.
    const validMs = new Date(share.inviteExpiresAt).getTime() - since;
    expect(validMs).toBeGreaterThan(7 * 24 * 3600_000 - 60_000);
    expect(validMs).toBeLessThanOrEqual(7 * 24 * 3600_000 + 1000);

    expect(mail.subject).toBe('Ilse Brannock shared a bow with you on Pinwright');
    expect(mail.text).toContain('"Cedar Hollow slider"');
    expect(mail.text).toContain(`${config.publicUrl}/invite?token=${token}`);
    expect(mail.html).toContain(`/invite?token=${token}`);
    expect(mail.html).toContain('Cedar Hollow slider');

    const stored = await Token.findAll({ where: { shareId: share.id } });
    expect(stored.map((t) => t.tokenHash)).toEqual([sha256(token)]);

    const preview = await request(app).get(`/api/invites/${token}`);
    expect(preview.status).toBe(200);
    expect(preview.body.invite).toMatchObject({
      archerName: 'Ilse Brannock',
      bowNickname: 'Cedar Hollow slider',
      invitedEmail: tech.email,
    });

    const accepted = await tech.agent.post('/api/invites/accept').set(CSRF).send({ token });
    expect(accepted.status).toBe(200);
    expect(accepted.body.share).toMatchObject({ state: 'active', tech: { id: tech.user.id, name: 'Joss Harrow' } });

    const clients = await tech.agent.get('/api/clients');
    expect(clients.body.clients).toEqual([
      {
        archer: { id: archer.user.id, name: 'Ilse Brannock', email: archer.email },
        bows: [expect.objectContaining({ id: made.bow.id, nickname: 'Cedar Hollow slider', shareId: share.id })],
      },
    ]);
    const bowRes = await tech.agent.get(`/api/bows/${made.bow.id}`);
    expect(bowRes.status).toBe(200);
    // The technician is told whose bow it is.
    expect(bowRes.body.bow).toMatchObject({ userId: archer.user.id, ownerName: 'Ilse Brannock' });
    expect(bowRes.body.bow.sightIns).toHaveLength(1);
    expect((await tech.agent.get(`/api/sight-ins/${made.sightIn.id}`)).body.sightIn.marks).toHaveLength(3);
    expect((await tech.agent.get(`/api/builds/${made.build.id}`)).status).toBe(200);
    expect((await tech.agent.get(`/api/bows/${made.bow.id}/level`)).status).toBe(200);
    expect((await tech.agent.get(`/api/sight-ins/${made.sightIn.id}/sheet.svg`)).status).toBe(200);

    const shares = await archer.agent.get(`/api/bows/${made.bow.id}/shares`);
    expect(shares.body.shares).toEqual([
      expect.objectContaining({ id: share.id, state: 'active', tech: { id: tech.user.id, name: 'Joss Harrow', email: tech.email } }),
    ]);

    const log = await archer.agent.get(`/api/bows/${made.bow.id}/audit`);
    expect(log.body.entries.map((e: { action: string }) => e.action)).toEqual(['accepted', 'invited']);
  });

  it('refuses the link a second time, after it expires, and once the archer withdraws it', async () => {
    const { tech, token, archer, bow } = await sharedBow();
    const reuse = await tech.agent.post('/api/invites/accept').set(CSRF).send({ token });
    expect(reuse.status).toBe(410);
    expect(reuse.body.error.code).toBe('link_used');

    const other = await technician();
    const second = await invite(archer.agent, bow.id, other.email);
    await Token.update({ expiresAt: new Date(Date.now() - 1000) }, { where: { tokenHash: sha256(second.token) } });
    const preview = await request(app).get(`/api/invites/${second.token}`);
    expect(preview.status).toBe(410);
    expect(preview.body.error.code).toBe('link_expired');
    const late = await other.agent.post('/api/invites/accept').set(CSRF).send({ token: second.token });
    expect(late.status).toBe(410);
    expect((await Share.findByPk(second.share.id))?.state).toBe('invited');

    // A fresh invitation replaces the old link; withdrawing it leaves the link dead too.
    const third = await invite(archer.agent, bow.id, other.email);
    expect(third.share.id).toBe(second.share.id);
    expect((await archer.agent.post(`/api/shares/${third.share.id}/revoke`).set(CSRF)).status).toBe(200);
    const withdrawn = await other.agent.post('/api/invites/accept').set(CSRF).send({ token: third.token });
    expect(withdrawn.status).toBe(410);
    expect(withdrawn.body.error.code).toBe('link_withdrawn');
    expect((await other.agent.get(`/api/bows/${bow.id}`)).status).toBe(404);
  });

  it('lets the invited person create a technician account from the link, with the invited address only', async () => {
    const archer = await signedInAgent(app, { name: 'Wren Calder' });
    const made = await bowWithSightIn(archer.agent);
    const email = uniqueEmail('newtech');
    const { token } = await invite(archer.agent, made.bow.id, email);

    const wrongAddress = await request(app)
      .post('/api/invites/accept-new')
      .set(CSRF)
      .send({ token, name: 'Someone Else', email: uniqueEmail('other'), password: 'a long enough password' });
    expect(wrongAddress.status).toBe(400);
    expect(wrongAddress.body.error.fields.email).toBe(`Use the invited address, ${email}`);

    const agent = request.agent(app);
    const res = await agent
      .post('/api/invites/accept-new')
      .set(CSRF)
      .send({ token, name: 'Tobin Ashgrove', email, password: 'a long enough password' });
    expect(res.status).toBe(201);
    expect(res.body.user).toMatchObject({ email, role: 'tech', name: 'Tobin Ashgrove' });
    expect(res.body.share.state).toBe('active');
    expect((await agent.get('/api/me')).body.user.role).toBe('tech');
    expect((await agent.get(`/api/bows/${made.bow.id}`)).status).toBe(200);

    const again = await request(app)
      .post('/api/invites/accept-new')
      .set(CSRF)
      .send({ token, name: 'Tobin Again', email, password: 'a long enough password' });
    expect(again.status).toBe(410);
  });

  it('is accepted only by a technician account with the invited address', async () => {
    const archer = await signedInAgent(app);
    const made = await bowWithSightIn(archer.agent);
    const tech = await technician();
    const { share, token } = await invite(archer.agent, made.bow.id, tech.email);

    const notTech = await signedInAgent(app, { email: uniqueEmail('archer') });
    const asArcher = await notTech.agent.post('/api/invites/accept').set(CSRF).send({ token });
    expect(asArcher.status).toBe(403);
    expect(asArcher.body.error.message).toMatch(/technician account/);

    const otherTech = await technician();
    const wrongTech = await otherTech.agent.post('/api/invites/accept').set(CSRF).send({ token });
    expect(wrongTech.status).toBe(403);
    expect(wrongTech.body.error.message).toContain(tech.email);
    expect((await Share.findByPk(share.id))?.state).toBe('invited');

    expect((await tech.agent.post('/api/invites/accept').set(CSRF).send({ token })).status).toBe(200);
  });

  it('checks the address, refuses the archer’s own address, a bow already shared, and a bow that is not theirs', async () => {
    const { archer, tech, bow } = await sharedBow();
    const bad = await archer.agent.post(`/api/bows/${bow.id}/shares`).set(CSRF).send({ email: 'nope' });
    expect(bad.status).toBe(400);
    expect(bad.body.error.fields.email).toBe('Enter a valid e-mail address');
    const self = await archer.agent.post(`/api/bows/${bow.id}/shares`).set(CSRF).send({ email: archer.email });
    expect(self.status).toBe(400);
    const twice = await archer.agent.post(`/api/bows/${bow.id}/shares`).set(CSRF).send({ email: tech.email });
    expect(twice.status).toBe(409);

    const stranger = await signedInAgent(app);
    const notTheirs = await stranger.agent
      .post(`/api/bows/${bow.id}/shares`)
      .set(CSRF)
      .send({ email: uniqueEmail('x') });
    expect(notTheirs.status).toBe(404);
    expect((await stranger.agent.get(`/api/bows/${bow.id}/shares`)).status).toBe(404);
  });
});

describe('what a technician may do on a shared bow', () => {
  it('adds sight-ins, marks, level checks and changes, each written to the bow’s audit log', async () => {
    const { archer, tech, bow, build, sightIn } = await sharedBow('Marit Audit', 'Desmond Audit');

    const newSightIn = await tech.agent
      .post(`/api/bows/${bow.id}/sight-ins`)
      .set(CSRF)
      .send({ buildId: build.id, date: '2026-11-20', placeLabel: 'Shop lane', marks: knownMarks([20, 30, 50]) });
    expect(newSightIn.status).toBe(201);

    const stored = (await tech.agent.get(`/api/sight-ins/${sightIn.id}`)).body.sightIn.marks.map(
      ({ distance, unit, scaleMm, arrowsShot, note }: Record<string, unknown>) => ({ distance, unit, scaleMm, arrowsShot, note }),
    );
    const [extra] = knownMarks([50]);
    const appended = await tech.agent
      .patch(`/api/sight-ins/${sightIn.id}`)
      .set(CSRF)
      .send({ marks: [...stored, { ...extra, note: 'shop check' }] });
    expect(appended.status).toBe(200);
    expect(appended.body.sightIn.marks).toHaveLength(4);

    const check = await tech.agent.post(`/api/bows/${bow.id}/checks`).set(CSRF).send({ place: 'bench' });
    expect(check.status).toBe(201);
    const change = await tech.agent
      .post(`/api/bows/${bow.id}/changes`)
      .set(CSRF)
      .send({ kind: 'string', changedAt: new Date().toISOString(), note: 'New string and cables, 20 shots to settle' });
    expect(change.status).toBe(201);

    const log = await archer.agent.get(`/api/bows/${bow.id}/audit`);
    expect(log.status).toBe(200);
    const byTech = log.body.entries.filter((e: { actor: { id: number } | null }) => e.actor?.id === tech.user.id);
    const kinds = byTech.map((e: { action: string; recordType: string }) => `${e.action} ${e.recordType}`);
    expect(kinds).toEqual(
      expect.arrayContaining([
        'created sight-in',
        'created sight-in-mark',
        'created level-check',
        'created level-step',
        'created bow-change',
        'accepted share',
      ]),
    );
    // Appending a mark rewrites the sight-in's mark set; the log names only the added mark, and no deletion.
    expect(kinds.filter((kind: string) => kind.startsWith('deleted'))).toEqual([]);
    const markEntries = byTech.filter((e: { recordType: string; summary: string }) => e.recordType === 'sight-in-mark');
    expect(markEntries.map((e: { summary: string }) => e.summary)).toEqual(
      expect.arrayContaining([`Added a mark: 50 yd at ${extra.scaleMm} mm`, 'Added 3 sight-in marks']),
    );
    // A refit alone is not logged as a change of the technician's.
    expect(byTech.filter((e: { action: string; recordType: string }) => e.action === 'updated' && e.recordType === 'sight-in')).toEqual([]);
    const checkEntry = byTech.find((e: { recordType: string }) => e.recordType === 'level-check');
    expect(checkEntry).toMatchObject({
      recordId: check.body.check?.id ?? expect.any(Number),
      bowId: bow.id,
      actor: { name: 'Desmond Audit', role: 'tech' },
    });
    const changeEntry = byTech.find((e: { recordType: string }) => e.recordType === 'bow-change');
    expect(changeEntry.summary).toContain('New string and cables');
    expect(byTech.every((e: { at: string }) => !Number.isNaN(Date.parse(e.at)))).toBe(true);

    // The archer's own writes are not audited, and the technician cannot read the log.
    const before = await AuditEntry.count({ where: { bowId: bow.id } });
    expect((await archer.agent.post(`/api/bows/${bow.id}/checks`).set(CSRF).send({ place: 'range' })).status).toBe(201);
    expect(await AuditEntry.count({ where: { bowId: bow.id } })).toBe(before);
    expect((await tech.agent.get(`/api/bows/${bow.id}/audit`)).status).toBe(403);
  });

  it('is refused every delete and every change to the archer’s records, and nothing changes', async () => {
    const { archer, tech, bow, build, sightIn } = await sharedBow();
    const change = await archer.agent
      .post(`/api/bows/${bow.id}/changes`)
      .set(CSRF)
      .send({ kind: 'rest', changedAt: new Date().toISOString(), note: '' });
    const tape = await archer.agent.post(`/api/sight-ins/${sightIn.id}/tapes`).set(CSRF).send({ fromDistance: 20, toDistance: 60 });
    expect(tape.status).toBe(201);
    const marks = (await archer.agent.get(`/api/sight-ins/${sightIn.id}`)).body.sightIn.marks;
    const auditBefore = await AuditEntry.count({ where: { bowId: bow.id } });

    const refused = [
      () => tech.agent.delete(`/api/bows/${bow.id}`).set(CSRF),
      () => tech.agent.patch(`/api/bows/${bow.id}`).set(CSRF).send({ nickname: 'Mine now' }),
      () => tech.agent.delete(`/api/sight-ins/${sightIn.id}`).set(CSRF),
      () => tech.agent.patch(`/api/sight-ins/${sightIn.id}`).set(CSRF).send({ placeLabel: 'Elsewhere' }),
      () =>
        tech.agent
          .patch(`/api/sight-ins/${sightIn.id}`)
          .set(CSRF)
          .send({
            marks: marks.slice(1).map(({ distance, unit, scaleMm, arrowsShot, note }: Record<string, unknown>) => ({
              distance,
              unit,
              scaleMm,
              arrowsShot,
              note,
            })),
          }),
      () => tech.agent.delete(`/api/builds/${build.id}`).set(CSRF),
      () => tech.agent.patch(`/api/builds/${build.id}`).set(CSRF).send({ name: 'Renamed' }),
      // Adding a build is allowed since issue 15 (tests/api/technician-builds.test.ts); changing one is not.
      () => tech.agent.delete(`/api/tapes/${tape.body.tape.id}`).set(CSRF),
      () => tech.agent.delete(`/api/changes/${change.body.change.id}`).set(CSRF),
      () =>
        tech.agent
          .post(`/api/bows/${bow.id}/shares`)
          .set(CSRF)
          .send({ email: uniqueEmail('friend') }),
      () => tech.agent.get(`/api/bows/${bow.id}/shares`),
    ];
    for (const [index, send] of refused.entries()) {
      const res = await send();
      expect({ index, status: res.status }).toEqual({ index, status: 403 });
    }
    // Revoking someone's share is answered as if there were no such share.
    expect((await tech.agent.post(`/api/shares/${(await Share.findOne({ where: { bowId: bow.id } }))!.id}/revoke`).set(CSRF)).status).toBe(
      404,
    );

    expect(await Bow.findByPk(bow.id)).not.toBeNull();
    expect((await Bow.findByPk(bow.id))!.nickname).toBe(bow.nickname);
    expect((await SightIn.findByPk(sightIn.id))!.placeLabel).toBe('Test range');
    expect(await SightInMark.count({ where: { sightInId: sightIn.id } })).toBe(3);
    expect(await AuditEntry.count({ where: { bowId: bow.id } })).toBe(auditBefore);
  });

  it('sees nothing of the archer’s other bows or of another technician’s clients', async () => {
    const { archer, tech } = await sharedBow();
    const unshared = await bowWithSightIn(archer.agent, [20, 40], {}, { nickname: 'Not shared' });
    for (const path of [
      `/api/bows/${unshared.bow.id}`,
      `/api/bows/${unshared.bow.id}/sight-ins`,
      `/api/sight-ins/${unshared.sightIn.id}`,
      `/api/builds/${unshared.build.id}`,
      `/api/bows/${unshared.bow.id}/checks`,
    ]) {
      expect({ path, status: (await tech.agent.get(path)).status }).toEqual({ path, status: 404 });
    }
    const write = await tech.agent.post(`/api/bows/${unshared.bow.id}/checks`).set(CSRF).send({ place: 'bench' });
    expect(write.status).toBe(404);

    const elsewhere = await sharedBow('Other Archer', 'Other Technician');
    expect((await tech.agent.get(`/api/bows/${elsewhere.bow.id}`)).status).toBe(404);
    expect((await tech.agent.get(`/api/sight-ins/${elsewhere.sightIn.id}`)).status).toBe(404);
    const clients = (await tech.agent.get('/api/clients')).body.clients;
    expect(clients.flatMap((c: { bows: { id: number }[] }) => c.bows.map((b) => b.id))).not.toContain(elsewhere.bow.id);

    // Clients is for technicians only.
    expect((await archer.agent.get('/api/clients')).status).toBe(403);
  });
});

describe('revoking', () => {
  it('takes effect on the technician’s next request', async () => {
    const { archer, tech, bow, share } = await sharedBow('Marit Revoke', 'Desmond Revoke');
    expect((await tech.agent.get(`/api/bows/${bow.id}`)).status).toBe(200);

    const revoked = await archer.agent.post(`/api/shares/${share.id}/revoke`).set(CSRF);
    expect(revoked.status).toBe(200);
    expect(revoked.body.share).toMatchObject({ state: 'revoked', revokedAt: expect.any(String) });

    expect((await tech.agent.get(`/api/bows/${bow.id}`)).status).toBe(404);
    expect((await tech.agent.post(`/api/bows/${bow.id}/checks`).set(CSRF).send({ place: 'bench' })).status).toBe(404);
    expect((await tech.agent.get('/api/clients')).body.clients).toEqual([]);

    const log = await archer.agent.get(`/api/bows/${bow.id}/audit`);
    expect(log.body.entries[0]).toMatchObject({
      action: 'revoked',
      recordType: 'share',
      actor: { id: archer.user.id },
      summary: expect.stringContaining('Desmond Revoke'),
    });
    expect((await archer.agent.get('/api/shares')).body.shares.map((s: { id: number }) => s.id)).not.toContain(share.id);
  });
});

describe('the demo scenario', () => {
  it('shares the archer’s first bow with the technician once, however often it runs', async () => {
    const archer = await signedInAgent(app, { name: 'Demo Archer Copy' });
    const tech = await technician('Demo Technician Copy');
    const archerUser = (await User.findByPk(archer.user.id))!;
    const techUser = (await User.findByPk(tech.user.id))!;
    await seedBows(archerUser);
    const accounts = { archer: archerUser, tech: techUser, admin: archerUser };
    await seedSharingStep(accounts);
    await seedSharingStep(accounts);
    const shares = await Share.findAll({ where: { archerId: archerUser.id } });
    expect(shares).toHaveLength(1);
    expect(shares[0]).toMatchObject({ state: 'active', techId: techUser.id });
    const clients = (await tech.agent.get('/api/clients')).body.clients;
    expect(clients).toEqual([expect.objectContaining({ archer: expect.objectContaining({ id: archerUser.id }) })]);
    expect((await tech.agent.get(`/api/bows/${shares[0].bowId}`)).status).toBe(200);
  });
});
