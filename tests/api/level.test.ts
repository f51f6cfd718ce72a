import zlib from 'node:zlib';
import request from 'supertest';
import sharp from 'sharp';
import { CSRF, closeDb, signedInAgent, testApp } from '@/tests/helpers/api';
import fs from 'node:fs';
import path from 'node:path';
import { config } from '@/server/config';
import { Bow, BowChange, LevelCheck, Photo, Share, User } from '@/server/models';
import { seedBows } from '@/server/seed/bows';
import { seedLevel } from '@/server/seed/level';

const app = testApp();
type Agent = Awaited<ReturnType<typeof signedInAgent>>['agent'];

/** A real PNG (solid colour), built by hand: signature, IHDR, one IDAT, IEND (PNG spec, ISO/IEC 15948). */
function png(width = 4, height = 3): Buffer {
  const chunk = (type: string, data: Buffer) => {
    const body = Buffer.concat([Buffer.from(type, 'ascii'), data]);
    const length = Buffer.alloc(4);
    length.writeUInt32BE(data.length);
    const crc = Buffer.alloc(4);
    crc.writeUInt32BE(zlib.crc32(body));
    return Buffer.concat([length, body, crc]);
  };
  const header = Buffer.alloc(13);
  header.writeUInt32BE(width, 0);
  header.writeUInt32BE(height, 4);
  header[8] = 8; // bit depth
  header[9] = 2; // colour type: RGB
  const row = Buffer.concat([Buffer.from([0]), Buffer.alloc(width * 3, 0x80)]);
  const pixels = zlib.deflateSync(Buffer.concat(Array.from({ length: height }, () => row)));
  return Buffer.concat([
    Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]),
    chunk('IHDR', header),
    chunk('IDAT', pixels),
    chunk('IEND', Buffer.alloc(0)),
  ]);
}

/** A bow for `userId`, written straight to the bows table (the bows API has its own tests). */
async function makeBow(userId: number, nickname = 'Test slider') {
  const bow = await Bow.create({
    userId,
    nickname,
    hand: 'right',
    drawWeightLb: 60,
    drawLengthMm: 711,
    letOffPct: 80,
    ratedSpeedFps: null,
    sightDescription: 'Single-pin slider, 2nd and 3rd axis adjustable',
    sightKind: 'single-pin-slider',
    sightRadiusMm: 840,
    peepHeightMm: 110,
    scaleDirection: 'down',
    tapeWidthMm: 8,
    pinDistances: [],
    pinDistanceUnit: 'yd',
    notes: '',
  } as never);
  return bow.id as number;
}

const allPass = ['setup', 'first-axis', 'second-axis', 'third-axis', 'range'].map((step) => ({ step, result: 'pass' }));

let owner: { agent: Agent; user: { id: number } };
let stranger: { agent: Agent; user: { id: number } };
let bowId: number;

beforeAll(async () => {
  owner = await signedInAgent(app, { name: 'Level Owner' });
  stranger = await signedInAgent(app, { name: 'Someone Else' });
  bowId = await makeBow(owner.user.id);
});

afterAll(closeDb);

describe('level checks: start, work, resume, complete', () => {
  let checkId: number;

  it('starts with a bow that was never checked', async () => {
    const res = await owner.agent.get(`/api/bows/${bowId}/level`);
    expect(res.status).toBe(200);
    expect(res.body).toMatchObject({ state: 'none', reason: 'Never checked.', lastCheck: null, changesSince: [], openCheckId: null });
  });

  it('starts a check with five unworked steps', async () => {
    const res = await owner.agent.post(`/api/bows/${bowId}/checks`).set(CSRF).send({ place: 'bench' });
    expect(res.status).toBe(201);
    checkId = res.body.check.id;
    expect(res.body.check).toMatchObject({
      bowId,
      place: 'bench',
      status: 'open',
      completedAt: null,
      performedBy: { id: owner.user.id, name: 'Level Owner' },
    });
    expect(res.body.check.steps.map((s: { step: string }) => s.step)).toEqual([
      'setup',
      'first-axis',
      'second-axis',
      'third-axis',
      'range',
    ]);
    expect(res.body.check.steps.every((s: { result: unknown }) => s.result === null)).toBe(true);
  });

  it('refuses a second open check on the same bow (resume instead)', async () => {
    const res = await owner.agent.post(`/api/bows/${bowId}/checks`).set(CSRF).send({ place: 'range' });
    expect(res.status).toBe(409);
    expect(res.body.error.fields.openCheckId).toBe(String(checkId));
  });

  it('saves steps one at a time and resumes where it was left', async () => {
    const first = await owner.agent
      .patch(`/api/checks/${checkId}`)
      .set(CSRF)
      .send({ steps: [{ step: 'setup', result: 'pass' }] });
    expect(first.status).toBe(200);
    const second = await owner.agent
      .patch(`/api/checks/${checkId}`)
      .set(CSRF)
      .send({
        steps: [{ step: 'first-axis', result: 'adjusted', reading: 1.5, readingUnit: 'deg', adjustment: ' Turned the mount a little ' }],
      });
    expect(second.status).toBe(200);

    // Resume: the open check is found from the bow, and reads back as saved.
    const level = await owner.agent.get(`/api/bows/${bowId}/level`);
    expect(level.body.openCheckId).toBe(checkId);
    expect(level.body.state).toBe('none');
    const resumed = await owner.agent.get(`/api/checks/${checkId}`);
    expect(resumed.status).toBe(200);
    const steps = resumed.body.check.steps;
    expect(steps[0]).toMatchObject({ step: 'setup', result: 'pass' });
    expect(steps[1]).toMatchObject({ step: 'first-axis', result: 'adjusted', readingUnit: 'deg', adjustment: 'Turned the mount a little' });
    expect(steps[1].reading).toBeCloseTo(1.5, 9);
    expect(steps[2].result).toBeNull();
    const list = await owner.agent.get(`/api/bows/${bowId}/checks`);
    expect(list.body.checks.map((c: { id: number }) => c.id)).toContain(checkId);
  });

  it('refuses to complete while steps have no result, naming them', async () => {
    const res = await owner.agent.patch(`/api/checks/${checkId}`).set(CSRF).send({ complete: true });
    expect(res.status).toBe(400);
    expect(Object.keys(res.body.error.fields).sort()).toEqual(['steps.range', 'steps.second-axis', 'steps.third-axis']);
    expect(res.body.error.message).toMatch(/second axis/);
  });

  it('completes with the last steps, and the bow is verified', async () => {
    const res = await owner.agent
      .patch(`/api/checks/${checkId}`)
      .set(CSRF)
      .send({
        steps: [
          { step: 'second-axis', result: 'pass', reading: 0, readingUnit: 'bubble' },
          { step: 'third-axis', result: 'pass' },
          { step: 'range', result: 'skipped' },
        ],
        note: 'Bench in the garage',
        complete: true,
      });
    expect(res.status).toBe(200);
    expect(res.body.check.status).toBe('complete');
    expect(res.body.check.completedAt).toEqual(expect.any(String));
    const level = await owner.agent.get(`/api/bows/${bowId}/level`);
    expect(level.body.state).toBe('verified');
    expect(level.body.reason).toMatch(/range confirmation .* recommended/);
    expect(level.body.lastCheck).toMatchObject({ id: checkId, place: 'bench' });
    expect(level.body.openCheckId).toBeNull();
    expect(level.body.maxAgeDays).toBe(90);
  });

  it('keeps a completed check as a record', async () => {
    const res = await owner.agent
      .patch(`/api/checks/${checkId}`)
      .set(CSRF)
      .send({ steps: [{ step: 'setup', result: 'fail' }] });
    expect(res.status).toBe(409);
    const discard = await owner.agent.delete(`/api/checks/${checkId}`).set(CSRF);
    expect(discard.status).toBe(409);
  });

  it('makes the bow due when a new string is logged after the check, and verified again when it is deleted', async () => {
    const logged = await owner.agent
      .post(`/api/bows/${bowId}/changes`)
      .set(CSRF)
      .send({ kind: 'string', changedAt: new Date().toISOString(), note: 'New string, 18 twists' });
    expect(logged.status).toBe(201);
    expect(logged.body.change).toMatchObject({ kind: 'string', note: 'New string, 18 twists', loggedBy: { id: owner.user.id } });
    expect(logged.body.level.state).toBe('due');
    expect(logged.body.level.reason).toBe('New string the same day as, and after, the last check.');
    const level = await owner.agent.get(`/api/bows/${bowId}/level`);
    expect(level.body.changesSince.map((c: { id: number }) => c.id)).toEqual([logged.body.change.id]);

    const list = await owner.agent.get(`/api/bows/${bowId}/changes`);
    expect(list.body.changes[0].id).toBe(logged.body.change.id);

    const removed = await owner.agent.delete(`/api/changes/${logged.body.change.id}`).set(CSRF);
    expect(removed.status).toBe(204);
    expect((await owner.agent.get(`/api/bows/${bowId}/level`)).body.state).toBe('verified');
  });

  it('does not count a change logged before the check', async () => {
    const res = await owner.agent.post(`/api/bows/${bowId}/changes`).set(CSRF).send({ kind: 'peep', changedAt: '2020-01-02T10:00:00Z' });
    expect(res.status).toBe(201);
    expect(res.body.level.state).toBe('verified');
  });

  it('is failed when a later check leaves an axis failing', async () => {
    const started = await owner.agent.post(`/api/bows/${bowId}/checks`).set(CSRF).send({ place: 'range' });
    expect(started.status).toBe(201);
    const steps = allPass.map((s) => (s.step === 'third-axis' ? { step: s.step, result: 'fail' } : s));
    const done = await owner.agent.patch(`/api/checks/${started.body.check.id}`).set(CSRF).send({ steps, complete: true });
    expect(done.status).toBe(200);
    const level = await owner.agent.get(`/api/bows/${bowId}/level`);
    expect(level.body).toMatchObject({ state: 'failed', reason: 'The last check left the third axis failing.' });
    expect(level.body.lastCheck.id).toBe(started.body.check.id);
  });

  it('discards an open check', async () => {
    const started = await owner.agent.post(`/api/bows/${bowId}/checks`).set(CSRF).send({});
    expect(started.status).toBe(201);
    expect(started.body.check.place).toBe('bench');
    const gone = await owner.agent.delete(`/api/checks/${started.body.check.id}`).set(CSRF);
    expect(gone.status).toBe(204);
    expect((await owner.agent.get(`/api/checks/${started.body.check.id}`)).status).toBe(404);
  });
});

describe('level checks: validation', () => {
  let checkId: number;
  beforeAll(async () => {
    const otherBow = await makeBow(owner.user.id, 'Validation bow');
    const res = await owner.agent.post(`/api/bows/${otherBow}/checks`).set(CSRF).send({ place: 'bench' });
    checkId = res.body.check.id;
  });

  const patch = (body: unknown) =>
    owner.agent
      .patch(`/api/checks/${checkId}`)
      .set(CSRF)
      .send(body as object);

  it('refuses an unknown place and a bad bow id', async () => {
    const place = await owner.agent.post(`/api/bows/${bowId}/checks`).set(CSRF).send({ place: 'garage' });
    expect(place.status).toBe(400);
    expect(place.body.error.fields.place).toBe('Choose bench or range');
    const id = await owner.agent.get('/api/bows/abc/level');
    expect(id.status).toBe(400);
    expect(id.body.error.fields['params.bowId']).toMatch(/bow id must be a number/);
  });

  it('refuses an unknown result and step', async () => {
    const res = await patch({ steps: [{ step: 'fourth-axis', result: 'maybe' }] });
    expect(res.status).toBe(400);
    expect(res.body.error.fields['steps.0.step']).toMatch(/Choose one of the steps/);
    expect(res.body.error.fields['steps.0.result']).toBe('Choose pass, adjusted, fail or skipped');
  });

  it('asks what was adjusted', async () => {
    const res = await patch({ steps: [{ step: 'second-axis', result: 'adjusted', adjustment: '  ' }] });
    expect(res.status).toBe(400);
    expect(res.body.error.fields['steps.0.adjustment']).toBe('Say what you adjusted');
  });

  it('asks the unit of a reading and bounds it', async () => {
    const unitless = await patch({ steps: [{ step: 'second-axis', result: 'pass', reading: 2 }] });
    expect(unitless.body.error.fields['steps.0.readingUnit']).toBe('Choose the unit of the reading');
    const wild = await patch({ steps: [{ step: 'second-axis', result: 'pass', reading: 60, readingUnit: 'deg' }] });
    expect(wild.status).toBe(400);
    expect(wild.body.error.fields['steps.0.reading']).toBe('Reading must be between -45 and 45 degrees');
    const text = await patch({ steps: [{ step: 'second-axis', result: 'pass', reading: 'level', readingUnit: 'deg' }] });
    expect(text.body.error.fields['steps.0.reading']).toBe('Reading must be a number');
  });

  it('refuses a step listed twice, an empty update and complete: false', async () => {
    const twice = await patch({
      steps: [
        { step: 'setup', result: 'pass' },
        { step: 'setup', result: 'fail' },
      ],
    });
    expect(twice.body.error.fields['steps.1.step']).toBe('The set-up is listed twice');
    const empty = await patch({});
    expect(empty.status).toBe(400);
    expect(empty.body.error.message).toBe('Give step results, a note, a place or complete');
    const notTrue = await patch({ complete: false });
    expect(notTrue.body.error.fields.complete).toBe('Complete may only be true');
  });

  it('refuses a change without a valid kind or time, or in the future', async () => {
    const kind = await owner.agent
      .post(`/api/bows/${bowId}/changes`)
      .set(CSRF)
      .send({ kind: 'paint', changedAt: new Date().toISOString() });
    expect(kind.status).toBe(400);
    expect(kind.body.error.fields.kind).toMatch(/^Choose what changed/);
    const when = await owner.agent.post(`/api/bows/${bowId}/changes`).set(CSRF).send({ kind: 'rest', changedAt: 'last Tuesday' });
    expect(when.body.error.fields.changedAt).toBe('Enter when it changed as a date and time');
    const missing = await owner.agent.post(`/api/bows/${bowId}/changes`).set(CSRF).send({ kind: 'rest' });
    expect(missing.body.error.fields.changedAt).toBe('Enter when it changed');
    const future = await owner.agent
      .post(`/api/bows/${bowId}/changes`)
      .set(CSRF)
      .send({ kind: 'rest', changedAt: new Date(Date.now() + 24 * 3600_000).toISOString() });
    expect(future.status).toBe(400);
    expect(future.body.error.fields.changedAt).toBe('The change cannot be in the future');
  });

  it('needs a signed-in user and the CSRF header', async () => {
    expect((await request(app).get(`/api/bows/${bowId}/level`)).status).toBe(401);
    const noCsrf = await owner.agent.post(`/api/bows/${bowId}/changes`).send({ kind: 'rest', changedAt: new Date().toISOString() });
    expect(noCsrf.status).toBe(403);
  });
});

describe('photos', () => {
  let checkId: number;
  let photoId: number;
  const image = png();

  beforeAll(async () => {
    const photoBow = await makeBow(owner.user.id, 'Photo bow');
    const res = await owner.agent.post(`/api/bows/${photoBow}/checks`).set(CSRF).send({ place: 'bench' });
    checkId = res.body.check.id;
  });

  it('accepts a PNG for a step and serves it back to the owner', async () => {
    const res = await owner.agent
      .post(`/api/checks/${checkId}/steps/second-axis/photo`)
      .set(CSRF)
      .attach('photo', image, { filename: 'bubble.png', contentType: 'image/png' });
    expect(res.status).toBe(201);
    photoId = res.body.photo.id;
    // Stored re-encoded without metadata (photo-service.ts), so its size is the re-encoded file's.
    expect(res.body.photo).toMatchObject({ url: `/api/photos/${photoId}`, mimeType: 'image/png', sizeBytes: expect.any(Number) });
    const check = await owner.agent.get(`/api/checks/${checkId}`);
    expect(check.body.check.steps[2].photo.id).toBe(photoId);

    const served = await owner.agent
      .get(`/api/photos/${photoId}`)
      .buffer(true)
      .parse((r, done) => {
        const parts: Buffer[] = [];
        r.on('data', (part: Buffer) => parts.push(part));
        r.on('end', () => done(null, Buffer.concat(parts)));
      });
    expect(served.status).toBe(200);
    expect(served.headers['content-type']).toBe('image/png');
    expect((served.body as Buffer).length).toBe(res.body.photo.sizeBytes);
    const decoded = await sharp(served.body as Buffer)
      .raw()
      .toBuffer({ resolveWithObject: true });
    expect(decoded.info).toMatchObject({ width: 4, height: 3, format: 'raw' });
    expect([...decoded.data].every((value) => value === 0x80)).toBe(true); // the same grey pixels
  });

  it('refuses a text file renamed .jpg, whatever type it claims', async () => {
    const res = await owner.agent
      .post(`/api/checks/${checkId}/steps/first-axis/photo`)
      .set(CSRF)
      .attach('photo', Buffer.from('not a picture at all, just words\n'.repeat(20)), { filename: 'sight.jpg', contentType: 'image/jpeg' });
    expect(res.status).toBe(415);
    expect(res.body.error.message).toMatch(/JPEG, PNG or WebP/);
  });

  it('refuses a photo over 5 MB with a plain 413', async () => {
    const big = Buffer.concat([image, Buffer.alloc(5 * 1024 * 1024 + 1 - image.length)]);
    expect(big.length).toBe(5 * 1024 * 1024 + 1);
    const res = await owner.agent
      .post(`/api/checks/${checkId}/steps/first-axis/photo`)
      .set(CSRF)
      .attach('photo', big, { filename: 'big.png', contentType: 'image/png' });
    expect(res.status).toBe(413);
    expect(res.body.error.message).toBe('The photo is larger than 5 MB; send a smaller one.');
  });

  it('asks for a file when none is sent', async () => {
    const res = await owner.agent.post(`/api/checks/${checkId}/steps/first-axis/photo`).set(CSRF).field('note', 'x');
    expect(res.status).toBe(400);
  });

  it('serves nobody else the photo (404)', async () => {
    expect((await stranger.agent.get(`/api/photos/${photoId}`)).status).toBe(404);
    expect((await request(app).get(`/api/photos/${photoId}`)).status).toBe(401);
  });

  it('stores the bytes outside the database under a random name, and removes them with the bow', async () => {
    const doomedBow = await makeBow(owner.user.id, 'Doomed bow');
    const started = await owner.agent.post(`/api/bows/${doomedBow}/checks`).set(CSRF).send({ place: 'bench' });
    const up = await owner.agent
      .post(`/api/checks/${started.body.check.id}/steps/setup/photo`)
      .set(CSRF)
      .attach('photo', image, { filename: 'my-vise.png', contentType: 'image/png' });
    expect(up.status).toBe(201);
    const row = (await Photo.findByPk(up.body.photo.id))!;
    expect(row.storageKey).toMatch(/^[0-9a-f]{32}\.png$/);
    const file = path.join(config.uploadDir, row.storageKey);
    expect(fs.readFileSync(file).length).toBe(up.body.photo.sizeBytes);
    const gone = await owner.agent.delete(`/api/bows/${doomedBow}`).set(CSRF);
    expect(gone.status).toBe(204);
    expect(fs.existsSync(file)).toBe(false);
    expect(await Photo.findByPk(up.body.photo.id)).toBeNull();
  });

  it('replaces and removes a step photo', async () => {
    const again = await owner.agent
      .post(`/api/checks/${checkId}/steps/second-axis/photo`)
      .set(CSRF)
      .attach('photo', png(2, 2), { filename: 'again.png', contentType: 'image/png' });
    expect(again.status).toBe(201);
    expect((await owner.agent.get(`/api/photos/${photoId}`)).status).toBe(404);
    const removed = await owner.agent.delete(`/api/checks/${checkId}/steps/second-axis/photo`).set(CSRF);
    expect(removed.status).toBe(204);
    expect((await owner.agent.get(`/api/photos/${again.body.photo.id}`)).status).toBe(404);
  });
});

describe('another account sees nothing (404 everywhere)', () => {
  let checkId: number;
  let changeId: number;
  let photoId: number;

  beforeAll(async () => {
    const res = await owner.agent.post(`/api/bows/${bowId}/checks`).set(CSRF).send({ place: 'bench' });
    checkId = res.body.check.id;
    const change = await owner.agent.post(`/api/bows/${bowId}/changes`).set(CSRF).send({ kind: 'rest', changedAt: '2021-03-04T05:06:07Z' });
    changeId = change.body.change.id;
    const photo = await owner.agent
      .post(`/api/checks/${checkId}/steps/setup/photo`)
      .set(CSRF)
      .attach('photo', png(), { filename: 'vise.png', contentType: 'image/png' });
    photoId = photo.body.photo.id;
  });

  it.each([
    ['GET', '/api/bows/:bowId/level', () => `/api/bows/${bowId}/level`],
    ['GET', '/api/bows/:bowId/readiness', () => `/api/bows/${bowId}/readiness`],
    ['GET', '/api/bows/:bowId/checks', () => `/api/bows/${bowId}/checks`],
    ['POST', '/api/bows/:bowId/checks', () => `/api/bows/${bowId}/checks`],
    ['GET', '/api/checks/:checkId', () => `/api/checks/${checkId}`],
    ['PATCH', '/api/checks/:checkId', () => `/api/checks/${checkId}`],
    ['DELETE', '/api/checks/:checkId', () => `/api/checks/${checkId}`],
    ['GET', '/api/bows/:bowId/changes', () => `/api/bows/${bowId}/changes`],
    ['POST', '/api/bows/:bowId/changes', () => `/api/bows/${bowId}/changes`],
    ['DELETE', '/api/changes/:changeId', () => `/api/changes/${changeId}`],
    ['POST', '/api/checks/:checkId/steps/setup/photo', () => `/api/checks/${checkId}/steps/setup/photo`],
    ['DELETE', '/api/checks/:checkId/steps/setup/photo', () => `/api/checks/${checkId}/steps/setup/photo`],
    ['GET', '/api/photos/:photoId', () => `/api/photos/${photoId}`],
  ])('%s %s', async (method, _label, path) => {
    const url = path();
    const agent = stranger.agent;
    const body: Record<string, object> = {
      POST: url.endsWith('/changes') ? { kind: 'rest', changedAt: new Date().toISOString() } : { place: 'bench' },
      PATCH: { steps: [{ step: 'setup', result: 'pass' }] },
    };
    let res;
    if (method === 'GET') res = await agent.get(url);
    else if (method === 'DELETE') res = await agent.delete(url).set(CSRF);
    else if (url.endsWith('/photo'))
      res = await agent.post(url).set(CSRF).attach('photo', png(), { filename: 'x.png', contentType: 'image/png' });
    else res = await (method === 'POST' ? agent.post(url) : agent.patch(url)).set(CSRF).send(body[method]);
    expect(res.status).toBe(404);
    expect(res.body.error.code).toBe('not_found');
  });

  it('left the owner’s records untouched', async () => {
    const check = await owner.agent.get(`/api/checks/${checkId}`);
    expect(check.body.check.steps[0]).toMatchObject({ result: null, photo: { id: photoId } });
    const changes = await owner.agent.get(`/api/bows/${bowId}/changes`);
    expect(changes.body.changes.map((c: { id: number }) => c.id)).toContain(changeId);
  });
});

describe('readiness', () => {
  it('summarises a bow without sight-ins', async () => {
    const fresh = await makeBow(owner.user.id, 'Readiness bow');
    const res = await owner.agent.get(`/api/bows/${fresh}/readiness`);
    expect(res.status).toBe(200);
    expect(res.body).toMatchObject({ bow: { id: fresh, nickname: 'Readiness bow' }, level: { state: 'none' }, marks: null, tape: null });
    expect(res.body.warnings).toEqual(['Level: Never checked.', 'No sight-in yet: there are no confirmed marks for this bow.']);
  });
});

describe('demo seed and the bows list', () => {
  it('gives one bow verified and one due, shown in GET /api/bows, and seeds only once', async () => {
    const seeded = await signedInAgent(app, { name: 'Seed Archer' });
    const archer = (await User.findByPk(seeded.user.id))!;
    await seedBows(archer);
    await seedLevel(archer);
    const bowIds = (await Bow.findAll({ where: { userId: archer.id } })).map((bow) => bow.id);
    const counts = async () => ({
      checks: await LevelCheck.count({ where: { bowId: bowIds } }),
      changes: await BowChange.count({ where: { bowId: bowIds } }),
    });
    const first = await counts();
    expect(first).toEqual({ checks: 2, changes: 1 });
    await seedLevel(archer);
    expect(await counts()).toEqual(first);

    const list = await seeded.agent.get('/api/bows');
    expect(list.status).toBe(200);
    const byName = Object.fromEntries(
      list.body.bows.map((bow: { nickname: string; readiness: { level: { state: string; reason: string } } }) => [
        bow.nickname,
        bow.readiness.level,
      ]),
    );
    expect(byName['Timberline slider']).toMatchObject({ state: 'verified', reason: 'Verified 9 days ago, on the bench and at the range.' });
    expect(byName['Cedar five-pin']).toMatchObject({ state: 'due', reason: 'New string 12 days after the last check.' });

    const cedar = list.body.bows.find((bow: { nickname: string }) => bow.nickname === 'Cedar five-pin');
    const detail = await seeded.agent.get(`/api/bows/${cedar.id}`);
    expect(detail.body.bow.readiness.level.state).toBe('due');
  });

  it('builds the trip readiness from the seeded sight-ins and tapes', async () => {
    const seeded = await signedInAgent(app, { name: 'Trip Archer' });
    const archer = (await User.findByPk(seeded.user.id))!;
    await seedBows(archer);
    await seedLevel(archer);
    const cedar = (await Bow.findOne({ where: { userId: archer.id, nickname: 'Cedar five-pin' } }))!;
    const res = await seeded.agent.get(`/api/bows/${cedar.id}/readiness`);
    expect(res.status).toBe(200);
    expect(res.body.level.state).toBe('due');
    expect(res.body.marks.marks.length).toBeGreaterThanOrEqual(2);
    // The longest confirmed mark is the largest distance of the latest sight-in's marks.
    const longest = Math.max(...res.body.marks.marks.map((m: { distance: number }) => m.distance));
    expect(res.body.marks.longestDistance).toBe(longest);
    expect(res.body.tape).not.toBeNull();
    expect(res.body.warnings).toHaveLength(2);
    expect(res.body.warnings[0]).toBe('Level: New string 12 days after the last check.');
    // The staleness rule's words (shared/staleness.ts): the change, its date, and what to do.
    expect(res.body.warnings[1]).toMatch(
      /^Latest sight-in \(24 Oct 2026\): New string on \d{1,2} \w{3} \d{4}, after this sight-in: confirm the marks at the range\.$/,
    );
    // The fit's "confirm at" distances all lie off this tape's span (20–60 yd), so none is listed.
    expect(res.body.tape).toMatchObject({ fromDistance: 20, toDistance: 60, unit: 'yd', fromLatestSightIn: true });

    // On the hunting bow, any "confirm at" distances named lie on its tape's span.
    const timberline = (await Bow.findOne({ where: { userId: archer.id, nickname: 'Timberline slider' } }))!;
    const trip = (await seeded.agent.get(`/api/bows/${timberline.id}/readiness`)).body;
    expect(trip.level.state).toBe('verified');
    for (const warning of trip.warnings as string[]) {
      const named = /^Fit: confirm at (.+) (yd|m) before relying on the tape there/.exec(warning);
      if (!named) continue;
      for (const distance of named[1].replace(' and ', ', ').split(', ').map(Number)) {
        expect(distance).toBeGreaterThanOrEqual(trip.tape.fromDistance);
        expect(distance).toBeLessThanOrEqual(trip.tape.toDistance);
      }
    }
    // The tape comes from the newest sight-in that has one, and its span past the longest mark is flagged.
    expect(trip.tape).toMatchObject({ fromLatestSightIn: true, sightInDate: trip.marks.date });
    expect(trip.warnings).toContain(
      `The tape runs to ${trip.tape.toDistance} yd, beyond the longest confirmed mark (${trip.marks.longestDistance} yd): the distances beyond it are estimates until shot at the range.`,
    );
  });
});

describe('a technician the bow is shared with', () => {
  it('reads the level, checks and photos, adds checks and changes, but deletes only their own change', async () => {
    const archer = await signedInAgent(app, { name: 'Sharing Archer' });
    const tech = await signedInAgent(app, { name: 'Shop Tech' });
    await User.update({ role: 'tech' }, { where: { id: tech.user.id } });
    const sharedBow = await makeBow(archer.user.id, 'Shared bow');
    const share = await Share.create({
      bowId: sharedBow,
      archerId: archer.user.id,
      techId: tech.user.id,
      invitedEmail: tech.email,
      state: 'active',
      acceptedAt: new Date(),
      revokedAt: null,
    });

    const archerChange = await archer.agent
      .post(`/api/bows/${sharedBow}/changes`)
      .set(CSRF)
      .send({ kind: 'rest', changedAt: '2022-02-02T10:00:00Z' });
    const archerCheck = await archer.agent.post(`/api/bows/${sharedBow}/checks`).set(CSRF).send({ place: 'bench' });
    const photo = await archer.agent
      .post(`/api/checks/${archerCheck.body.check.id}/steps/setup/photo`)
      .set(CSRF)
      .attach('photo', png(), { filename: 'a.png', contentType: 'image/png' });

    expect((await tech.agent.get(`/api/bows/${sharedBow}/level`)).status).toBe(200);
    expect((await tech.agent.get(`/api/photos/${photo.body.photo.id}`)).status).toBe(200);
    // The archer's open check reads back, but only its performer works on it.
    expect((await tech.agent.get(`/api/checks/${archerCheck.body.check.id}`)).status).toBe(200);
    const notTheirs = await tech.agent
      .patch(`/api/checks/${archerCheck.body.check.id}`)
      .set(CSRF)
      .send({ steps: [{ step: 'setup', result: 'pass' }] });
    expect(notTheirs.status).toBe(403);

    const techCheck = await tech.agent.post(`/api/bows/${sharedBow}/checks`).set(CSRF).send({ place: 'range' });
    expect(techCheck.status).toBe(201);
    expect(techCheck.body.check.performedBy).toEqual({ id: tech.user.id, name: 'Shop Tech' });
    const techChange = await tech.agent
      .post(`/api/bows/${sharedBow}/changes`)
      .set(CSRF)
      .send({ kind: 'peep', changedAt: '2022-03-03T10:00:00Z' });
    expect(techChange.status).toBe(201);
    expect((await tech.agent.delete(`/api/changes/${archerChange.body.change.id}`).set(CSRF)).status).toBe(403);
    expect((await tech.agent.delete(`/api/changes/${techChange.body.change.id}`).set(CSRF)).status).toBe(204);

    // Revoked: nothing more, at once.
    await share.update({ state: 'revoked', revokedAt: new Date() });
    expect((await tech.agent.get(`/api/bows/${sharedBow}/level`)).status).toBe(404);
    expect((await tech.agent.get(`/api/photos/${photo.body.photo.id}`)).status).toBe(404);
    expect((await tech.agent.get(`/api/checks/${techCheck.body.check.id}`)).status).toBe(404);
  });
});
