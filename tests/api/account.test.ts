/**
 * The account's own basics: change the password (other sign-ins end, this one
 * stays), download everything as one JSON file, delete the account (nothing of
 * it left in any table or the upload folder; what it added to others' bows
 * stays, its author shown as "a former account").
 */
import fs from 'node:fs';
import path from 'node:path';
import request from 'supertest';
import sharp from 'sharp';
import { QueryTypes } from 'sequelize';
import { config } from '@/server/config';
import { sequelize } from '@/server/db';
import { AuditEntry, BowChange, LevelCheck, Photo, Share, User } from '@/server/models';
import { recordAudit } from '@/server/services/audit-service';
import { CSRF, closeDb, signedInAgent, testApp } from '../helpers/api';
import { bowWithSightIn } from './bow-fixtures';

const app = testApp();
jest.setTimeout(60_000);
afterAll(closeDb);

/** A second browser signed in to the same account. */
async function secondSignIn(email: string, password: string) {
  const agent = request.agent(app);
  const res = await agent.post('/api/auth/sign-in').set(CSRF).send({ email, password });
  expect(res.status).toBe(200);
  return agent;
}

async function pngBytes() {
  return sharp({ create: { width: 6, height: 4, channels: 3, background: '#808080' } })
    .png()
    .toBuffer();
}

/** A level check with a photo on one of its steps; returns the photo's id. */
async function checkWithPhoto(agent: request.Agent, bowId: number) {
  const check = await agent.post(`/api/bows/${bowId}/checks`).set(CSRF).send({ place: 'bench' });
  expect(check.status).toBe(201);
  const photo = await agent
    .post(`/api/checks/${check.body.check.id}/steps/second-axis/photo`)
    .set(CSRF)
    .attach('photo', await pngBytes(), { filename: 'bubble.png', contentType: 'image/png' });
  expect(photo.status).toBe(201);
  return { checkId: check.body.check.id as number, photoId: photo.body.photo.id as number };
}

describe('change of password', () => {
  it('needs the current password, ends the other sign-ins and keeps this one', async () => {
    const owner = await signedInAgent(app, { name: 'Tamsin Oakridge' });
    const other = await secondSignIn(owner.email, owner.password);
    expect((await other.get('/api/me')).status).toBe(200);

    const wrong = await owner.agent
      .post('/api/me/password')
      .set(CSRF)
      .send({ currentPassword: 'not the password', newPassword: 'a brand new sentence' });
    expect(wrong.status).toBe(400);
    expect(wrong.body.error.fields.currentPassword).toBe('That password is not right');
    const short = await owner.agent.post('/api/me/password').set(CSRF).send({ currentPassword: owner.password, newPassword: 'short' });
    expect(short.status).toBe(400);
    expect(short.body.error.fields.newPassword).toBe('New password must be at least 10 characters');
    // Nothing changed by the refused attempts: the other sign-in still works.
    expect((await other.get('/api/me')).status).toBe(200);

    const changed = await owner.agent
      .post('/api/me/password')
      .set(CSRF)
      .send({ currentPassword: owner.password, newPassword: 'a brand new sentence' });
    expect(changed.status).toBe(200);
    expect(changed.body).toEqual({ endedSessions: 1, message: 'Password changed. Your 1 other sign-in was ended; this one stays.' });
    expect((await owner.agent.get('/api/me')).status).toBe(200);
    expect((await other.get('/api/me')).status).toBe(401);

    const old = await request(app).post('/api/auth/sign-in').set(CSRF).send({ email: owner.email, password: owner.password });
    expect(old.status).toBe(401);
    await secondSignIn(owner.email, 'a brand new sentence');
  });

  it('needs a sign-in and the CSRF header', async () => {
    expect((await request(app).post('/api/me/password').set(CSRF).send({ currentPassword: 'x', newPassword: 'yyyyyyyyyyyy' })).status).toBe(
      401,
    );
    const owner = await signedInAgent(app);
    expect((await owner.agent.post('/api/me/password').send({ currentPassword: owner.password, newPassword: 'yyyyyyyyyyyy' })).status).toBe(
      403,
    );
  });
});

describe('download everything', () => {
  it('is one JSON file with every bow of the account and its records, and nobody else’s', async () => {
    const owner = await signedInAgent(app, { name: 'Rhoswen Alder' });
    const first = await bowWithSightIn(owner.agent, [20, 40, 60], {}, { nickname: 'Fen slider' });
    const second = await bowWithSightIn(owner.agent, [20, 50], {}, { nickname: 'Moor pins' });
    await checkWithPhoto(owner.agent, first.bow.id);
    const change = await owner.agent
      .post(`/api/bows/${second.bow.id}/changes`)
      .set(CSRF)
      .send({ kind: 'rest', changedAt: new Date().toISOString(), note: 'new rest' });
    expect(change.status).toBe(201);
    const stranger = await signedInAgent(app);
    await bowWithSightIn(stranger.agent, [20, 40], {}, { nickname: 'Not hers' });

    const res = await owner.agent.get('/api/me/export.json').buffer(true);
    expect(res.status).toBe(200);
    expect(res.headers['content-type']).toMatch(/^application\/json/);
    expect(res.headers['content-disposition']).toMatch(/^attachment; filename="?pinwright-rhoswen-alder-everything\.json"?$/);
    const document = JSON.parse(res.text);
    expect(document).toMatchObject({
      format: 'pinwright-account-export',
      version: 1,
      account: { id: owner.user.id, name: 'Rhoswen Alder', email: owner.email },
    });
    expect(document.bows.map((entry: { bow: { nickname: string } }) => entry.bow.nickname)).toEqual(['Fen slider', 'Moor pins']);
    const [fen, moor] = document.bows;
    // The same records as each bow's own export.
    const own = JSON.parse((await owner.agent.get(`/api/bows/${first.bow.id}/export.json`).buffer(true)).text);
    expect(fen.bow).toEqual(own.bow);
    expect(fen.builds).toEqual(own.builds);
    expect(fen.sightIns).toEqual(own.sightIns);
    expect(fen.sightIns[0].marks.map((mark: { distance: number }) => mark.distance)).toEqual([20, 40, 60]);
    expect(moor.sightIns[0].marks).toHaveLength(2);
    // And the rest of each bow's records.
    expect(fen.levelChecks).toHaveLength(1);
    expect(fen.levelChecks[0].steps.length).toBeGreaterThan(0);
    expect(fen.photos).toHaveLength(1);
    expect(fen.photos[0].storageKey).toBeUndefined();
    expect(moor.changes).toEqual([expect.objectContaining({ kind: 'rest', note: 'new rest' })]);
    expect(res.text).not.toContain('Not hers');
    expect(res.text).not.toContain('passwordHash');
  });

  it('gives an account with no bows an empty list', async () => {
    const owner = await signedInAgent(app);
    const res = await owner.agent.get('/api/me/export.json').buffer(true);
    expect(res.status).toBe(200);
    expect(JSON.parse(res.text).bows).toEqual([]);
  });
});

describe('deleting the account', () => {
  it('refuses without the right password and deletes nothing', async () => {
    const owner = await signedInAgent(app);
    const made = await bowWithSightIn(owner.agent, [20, 40]);
    const res = await owner.agent.post('/api/me/delete').set(CSRF).send({ password: 'not it' });
    expect(res.status).toBe(400);
    expect(res.body.error.fields.password).toBe('That password is not right');
    const empty = await owner.agent.post('/api/me/delete').set(CSRF).send({});
    expect(empty.body.error.fields.password).toBe('Enter your password to delete the account');
    expect((await owner.agent.get(`/api/bows/${made.bow.id}`)).status).toBe(200);
  });

  it('removes it from every table and the upload folder; others’ bows keep what it added, as "a former account"', async () => {
    // Leaving: an archer with a bow, a sight-in, a level check with a photo, who is
    // also a technician on a friend's shared bow and worked on it.
    const leaving = await signedInAgent(app, { name: 'Quillon Varga' });
    const own = await bowWithSightIn(leaving.agent, [20, 40, 60], {}, { nickname: 'Varga ridge' });
    const { photoId } = await checkWithPhoto(leaving.agent, own.bow.id);
    const storageKey = (await Photo.findByPk(photoId))!.storageKey;
    expect(fs.existsSync(path.join(config.uploadDir, storageKey))).toBe(true);

    const friend = await signedInAgent(app, { name: 'Ebba Lindqvist' });
    const friends = await bowWithSightIn(friend.agent, [20, 40], {}, { nickname: 'Lindqvist hunter' });
    await Share.create({
      bowId: friends.bow.id,
      archerId: friend.user.id,
      techId: leaving.user.id,
      invitedEmail: leaving.email,
      state: 'active',
      acceptedAt: new Date(),
      revokedAt: null,
    });
    // An open invite to the leaving address, on another bow of the friend.
    const spare = await bowWithSightIn(friend.agent, [20, 40], {}, { nickname: 'Lindqvist spare' });
    await Share.create({
      bowId: spare.bow.id,
      archerId: friend.user.id,
      techId: null,
      invitedEmail: leaving.email,
      state: 'invited',
      acceptedAt: null,
      revokedAt: null,
    });
    const theirCheck = await leaving.agent.post(`/api/bows/${friends.bow.id}/checks`).set(CSRF).send({ place: 'bench' });
    expect(theirCheck.status).toBe(201);
    const theirChange = await leaving.agent
      .post(`/api/bows/${friends.bow.id}/changes`)
      .set(CSRF)
      .send({ kind: 'string', changedAt: new Date().toISOString(), note: 'new string' });
    expect(theirChange.status).toBe(201);
    await recordAudit({
      actorId: friend.user.id,
      action: 'invited',
      bowId: friends.bow.id,
      recordType: 'share',
      recordId: null,
      summary: `Invited ${leaving.email} to work on the bow`,
    });
    const second = await secondSignIn(leaving.email, leaving.password);

    const res = await leaving.agent.post('/api/me/delete').set(CSRF).send({ password: leaving.password });
    expect(res.status).toBe(200);
    expect(res.body.message).toBe('Your account and everything in it were deleted.');
    expect((await leaving.agent.get('/api/me')).status).toBe(401);
    expect((await second.get('/api/me')).status).toBe(401);
    expect((await request(app).post('/api/auth/sign-in').set(CSRF).send({ email: leaving.email, password: leaving.password })).status).toBe(
      401,
    );

    // The upload folder: its photo's file is gone.
    expect(fs.existsSync(path.join(config.uploadDir, storageKey))).toBe(false);

    // Every table: no column that refers to accounts holds its id, and no cell holds its e-mail or name.
    const foreignKeys = await sequelize.query<{ table: string; column: string }>(
      `SELECT TABLE_NAME AS \`table\`, COLUMN_NAME AS \`column\` FROM information_schema.KEY_COLUMN_USAGE
        WHERE TABLE_SCHEMA = DATABASE() AND REFERENCED_TABLE_NAME = 'users'`,
      { type: QueryTypes.SELECT },
    );
    expect(foreignKeys.length).toBeGreaterThan(5);
    for (const { table, column } of foreignKeys) {
      const [{ n }] = await sequelize.query<{ n: number }>(`SELECT COUNT(*) AS n FROM \`${table}\` WHERE \`${column}\` = ?`, {
        replacements: [leaving.user.id],
        type: QueryTypes.SELECT,
      });
      expect({ table, column, rows: Number(n) }).toEqual({ table, column, rows: 0 });
    }
    expect(await User.findByPk(leaving.user.id)).toBeNull();
    const tables = await sequelize.query<{ table: string }>(
      "SELECT TABLE_NAME AS `table` FROM information_schema.TABLES WHERE TABLE_SCHEMA = DATABASE() AND TABLE_TYPE = 'BASE TABLE'",
      { type: QueryTypes.SELECT },
    );
    for (const { table } of tables) {
      const rows = await sequelize.query(`SELECT * FROM \`${table}\``, { type: QueryTypes.SELECT });
      const text = JSON.stringify(rows);
      expect({
        table,
        email: text.includes(leaving.email),
        name: text.includes('Quillon Varga'),
        bow: text.includes('Varga ridge'),
      }).toEqual({ table, email: false, name: false, bow: false });
    }

    // The friend's bow keeps the check and the change, their author now unknown, shown as "a former account".
    const check = await LevelCheck.findByPk(theirCheck.body.check.id);
    expect(check?.userId).toBeNull();
    expect((await BowChange.findByPk(theirChange.body.change.id))?.userId).toBeNull();
    const checks = await friend.agent.get(`/api/bows/${friends.bow.id}/checks`);
    expect(checks.status).toBe(200);
    const shown = checks.body.checks.find((c: { id: number }) => c.id === theirCheck.body.check.id);
    expect(shown.performedBy.name).toBe('A former account');
    // Its share of the friend's bow has ended (gone), and so has the open invite.
    expect(await Share.count({ where: { bowId: [friends.bow.id, spare.bow.id] } })).toBe(0);
    // The friend's audit log keeps the invite entry, with the address taken out.
    const entries = await AuditEntry.findAll({ where: { bowId: friends.bow.id, action: 'invited' } });
    expect(entries.map((entry) => entry.summary)).toContain('Invited a former account to work on the bow');
    // The friend's own records are untouched.
    expect((await friend.agent.get(`/api/bows/${friends.bow.id}`)).status).toBe(200);
  });
});
