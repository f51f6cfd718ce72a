import { CSRF, closeDb, signedInAgent, testApp } from '@/tests/helpers/api';
import { bowWithBuild, bowWithSightIn } from './bow-fixtures';
import { AuditEntry, Bow, SetupEntry, Share, User } from '@/server/models';
import { seedBows } from '@/server/seed/bows';
import { seedLevel } from '@/server/seed/level';
import { seedTuning } from '@/server/seed/tuning';

const app = testApp();
type Agent = Awaited<ReturnType<typeof signedInAgent>>['agent'];

afterAll(closeDb);

async function shareWith(archer: { user: { id: number } }, bowId: number) {
  const tech = await signedInAgent(app, { name: 'Desmond Tuning' });
  await User.update({ role: 'tech' }, { where: { id: tech.user.id } });
  await Share.create({
    bowId,
    archerId: archer.user.id,
    techId: tech.user.id,
    invitedEmail: tech.email,
    state: 'active',
    acceptedAt: new Date(),
    revokedAt: null,
  });
  return tech;
}

const today = () => new Date().toISOString().slice(0, 10);
const entry = (agent: Agent, bowId: number, body: Record<string, unknown>) =>
  agent
    .post(`/api/bows/${bowId}/setup`)
    .set(CSRF)
    .send({ measuredOn: today(), ...body });

describe('set-up entries', () => {
  test('the archer records centre shot and D-loop; the latest shows; a first entry is not a change, a different one is', async () => {
    const archer = await signedInAgent(app);
    const { bow } = await bowWithBuild(archer.agent);
    const first = await entry(archer.agent, bow.id, { measure: 'centre-shot', valueMm: 20.6 });
    expect(first.status).toBe(201);
    expect(first.body.entry).toMatchObject({ measure: 'centre-shot', valueMm: 20.6, changeId: null, byTechnician: false });
    const same = await entry(archer.agent, bow.id, { measure: 'centre-shot', valueMm: 20.62 }); // re-typed through inches: not a change
    expect(same.body.entry.changeId).toBeNull();
    const loop = await entry(archer.agent, bow.id, { measure: 'd-loop', valueMm: 105, note: 'new loop material' });
    expect(loop.status).toBe(201);
    const moved = await entry(archer.agent, bow.id, { measure: 'centre-shot', valueMm: 22 });
    expect(moved.body.entry.changeId).toEqual(expect.any(Number));

    const list = await archer.agent.get(`/api/bows/${bow.id}/setup`);
    expect(list.body.latest['centre-shot'].valueMm).toBeCloseTo(22, 9);
    expect(list.body.latest['d-loop'].valueMm).toBeCloseTo(105, 9);
    expect(list.body.entries).toHaveLength(4);
    // The change is on the bow's log as a rest change, and the level check is due.
    const changes = await archer.agent.get(`/api/bows/${bow.id}/changes`);
    expect(changes.body.changes.map((c: { kind: string }) => c.kind)).toEqual(['rest']);
    expect(changes.body.changes[0].note).toMatch(/^Centre shot: 20\.6 mm → 22 mm/);
  });

  test('validation messages name the field', async () => {
    const archer = await signedInAgent(app);
    const { bow } = await bowWithBuild(archer.agent);
    const tooLong = await entry(archer.agent, bow.id, { measure: 'd-loop', valueMm: 400 });
    expect(tooLong.status).toBe(400);
    expect(tooLong.body.error.fields.valueMm).toBe('D-loop length must be between 10 and 160 mm');
    const noValue = await entry(archer.agent, bow.id, { measure: 'brace-height' });
    expect(noValue.body.error.fields.valueMm).toBe('Enter the brace height');
    const noAmount = await entry(archer.agent, bow.id, { measure: 'cam-timing', choice: 'top-first' });
    expect(noAmount.body.error.fields.valueMm).toBe('Enter the amount of the cam timing');
    const badChoice = await entry(archer.agent, bow.id, { measure: 'rest-kind', choice: 'magnet' });
    expect(badChoice.body.error.fields.choice).toBe('Choose the rest kind');
    const future = await entry(archer.agent, bow.id, { measure: 'd-loop', valueMm: 105, measuredOn: '2099-01-01' });
    expect(future.status).toBe(400);
    expect(future.body.error.fields.measuredOn).toBe('The date cannot be in the future');
    const text = await entry(archer.agent, bow.id, { measure: 'd-loop', valueMm: '4 1/4' });
    expect(text.body.error.fields.valueMm).toBe('The value must be a number');
    expect((await archer.agent.get(`/api/bows/${bow.id}/setup`)).body.entries).toHaveLength(0); // nothing partial
  });

  test('another account gets 404; a technician on a shared bow adds attributed entries, never changes the archer’s', async () => {
    const archer = await signedInAgent(app, { name: 'Marit Example' });
    const stranger = await signedInAgent(app);
    const { bow, build } = await bowWithBuild(archer.agent);
    expect((await stranger.agent.get(`/api/bows/${bow.id}/setup`)).status).toBe(404);
    expect((await entry(stranger.agent, bow.id, { measure: 'd-loop', valueMm: 105 })).status).toBe(404);
    expect((await stranger.agent.get(`/api/builds/${build.id}/arrow-sets`)).status).toBe(404);

    const tech = await shareWith(archer, bow.id);
    const added = await entry(tech.agent, bow.id, { measure: 'peep-height', valueMm: 113 });
    expect(added.status).toBe(201);
    expect(added.body.entry).toMatchObject({ byTechnician: true, addedBy: { name: 'Desmond Tuning' } });
    const seen = await archer.agent.get(`/api/bows/${bow.id}/setup`);
    expect(seen.body.latest['peep-height'].addedBy.name).toBe('Desmond Tuning');
    // The audit log names the technician's entry.
    const audit = await AuditEntry.findAll({ where: { bowId: bow.id, recordType: 'setup-entry' } });
    expect(audit.map((a) => a.action)).toContain('created');

    // An arrow set the archer added: the technician may not change its arrows.
    const set = await archer.agent
      .post(`/api/builds/${build.id}/arrow-sets`)
      .set(CSRF)
      .send({ name: 'Hunting', arrows: [{ number: 1, weightGr: 500 }] });
    expect(set.status).toBe(201);
    const patch = await tech.agent.patch(`/api/arrows/${set.body.set.arrows[0].id}`).set(CSRF).send({ status: 'retired' });
    expect(patch.status).toBe(403);
    // But the technician may add a set of their own and change it.
    const own = await tech.agent
      .post(`/api/builds/${build.id}/arrow-sets`)
      .set(CSRF)
      .send({ name: 'Shop weighed', arrows: [{ number: 1, weightGr: 501 }] });
    expect(own.status).toBe(201);
    expect(own.body.set).toMatchObject({ byTechnician: true, addedBy: { name: 'Desmond Tuning' } });
    expect((await tech.agent.patch(`/api/arrows/${own.body.set.arrows[0].id}`).set(CSRF).send({ status: 'practice' })).status).toBe(200);
  });
});

describe('change → readiness (the staleness rule on the bow and the Bench)', () => {
  test('a rest change after the sight-in with a tape asks to confirm at the range; a new sight-in clears it', async () => {
    const archer = await signedInAgent(app);
    const { bow, build, sightIn } = await bowWithSightIn(archer.agent, [20, 40, 60], { date: '2026-11-02' });
    const tape = await archer.agent
      .post(`/api/sight-ins/${sightIn.id}/tapes`)
      .set(CSRF)
      .send({ fromDistance: 20, toDistance: 60, step: 5, unit: 'yd', widthMm: 12 });
    expect(tape.status).toBe(201);
    let bench = await archer.agent.get('/api/bows');
    expect(bench.body.bows.find((b: { id: number }) => b.id === bow.id).readiness.confirm).toBeNull();

    const change = await archer.agent
      .post(`/api/bows/${bow.id}/changes`)
      .set(CSRF)
      .send({ kind: 'rest', changedAt: new Date().toISOString(), note: 'new drop-away' });
    expect(change.status).toBe(201);
    bench = await archer.agent.get('/api/bows');
    const confirm = bench.body.bows.find((b: { id: number }) => b.id === bow.id).readiness.confirm;
    expect(confirm).toMatchObject({ sightInId: sightIn.id, tapeId: tape.body.tape.id });
    expect(confirm.reason).toMatch(/^Tape: Rest changed on .*, after this sight-in: confirm the marks at the range\.$/);
    // The level check is due as before.
    expect(change.body.level.state).not.toBe('verified');
    // The sight-in screen's view.
    const stale = await archer.agent.get(`/api/sight-ins/${sightIn.id}/staleness`);
    expect(stale.body).toMatchObject({ state: 'confirm', canConfirm: true });

    // A new sight-in of the same build clears it.
    const newer = await archer.agent
      .post(`/api/bows/${bow.id}/sight-ins`)
      .set(CSRF)
      .send({
        buildId: build.id,
        date: today(),
        placeLabel: 'Test range',
        marks: sightIn.marks.map((m: Record<string, unknown>) => ({
          distance: m.distance,
          unit: m.unit,
          scaleMm: m.scaleMm,
          arrowsShot: 3,
          note: '',
        })),
      });
    expect(newer.status).toBe(201);
    bench = await archer.agent.get('/api/bows');
    expect(bench.body.bows.find((b: { id: number }) => b.id === bow.id).readiness.confirm).toBeNull();
  });

  test('editing the peep height in the bow form is a change; confirming at the range clears it', async () => {
    const archer = await signedInAgent(app);
    const { bow, sightIn } = await bowWithSightIn(archer.agent, [20, 40, 60], { date: '2026-11-02' });
    const edit = await archer.agent.patch(`/api/bows/${bow.id}`).set(CSRF).send({ peepHeightMm: 115 });
    expect(edit.status).toBe(200);
    const detail = await archer.agent.get(`/api/bows/${bow.id}`);
    expect(detail.body.bow.readiness.confirm.reason).toMatch(/^Sight-in: Peep moved on /);
    const changes = await archer.agent.get(`/api/bows/${bow.id}/changes`);
    expect(changes.body.changes[0]).toMatchObject({ kind: 'peep', note: 'Peep height edited on the bow: 112 → 115 mm' });
    // Editing the nickname is no change.
    await archer.agent.patch(`/api/bows/${bow.id}`).set(CSRF).send({ nickname: 'Renamed' });
    expect((await archer.agent.get(`/api/bows/${bow.id}/changes`)).body.changes).toHaveLength(1);

    // The printed sheet's header says so too.
    const staleSheet = await archer.agent.get(`/api/sight-ins/${sightIn.id}/sheet.svg`).buffer(true);
    expect(staleSheet.status).toBe(200);
    expect(String(staleSheet.body)).toContain('data-caution="header-note"');
    const confirmed = await archer.agent.post(`/api/sight-ins/${sightIn.id}/confirm-range`).set(CSRF).send({ note: '20 and 60 held' });
    expect(confirmed.status).toBe(201);
    expect(confirmed.body).toMatchObject({ state: 'current', confirmations: [{ note: '20 and 60 held' }] });
    expect((await archer.agent.get(`/api/bows/${bow.id}`)).body.bow.readiness.confirm).toBeNull();
    const sheet = await archer.agent.get(`/api/sight-ins/${sightIn.id}/sheet.svg`).buffer(true);
    expect(sheet.status).toBe(200);
    expect(String(sheet.body)).not.toContain('data-caution="header-note"');
  });

  test('a technician’s logged string change marks it too', async () => {
    const archer = await signedInAgent(app);
    const { bow, sightIn } = await bowWithSightIn(archer.agent, [20, 40, 60], { date: '2026-11-02' });
    const tech = await shareWith(archer, bow.id);
    expect(
      (await tech.agent.post(`/api/bows/${bow.id}/changes`).set(CSRF).send({ kind: 'string', changedAt: new Date().toISOString() })).status,
    ).toBe(201);
    const stale = await archer.agent.get(`/api/sight-ins/${sightIn.id}/staleness`);
    expect(stale.body.reason).toMatch(/^New string on /);
  });
});

describe('paper tuning', () => {
  test('a run of four shots ends clean; changes before a shot are logged; only a clean last shot ends clean', async () => {
    const archer = await signedInAgent(app);
    const { bow } = await bowWithBuild(archer.agent);
    const start = await archer.agent
      .post(`/api/bows/${bow.id}/paper-tunes`)
      .set(CSRF)
      .send({ distance: 5, unit: 'yd', startedOn: today() });
    expect(start.status).toBe(201);
    const runId = start.body.run.id;
    const shot = (body: Record<string, unknown>) => archer.agent.post(`/api/paper-tunes/${runId}/shots`).set(CSRF).send(body);
    expect((await shot({ tear: 'up', lengthMm: 25 })).status).toBe(201);
    const missing = await shot({ tear: 'left' });
    expect(missing.status).toBe(400);
    expect(missing.body.error.fields.lengthMm).toBe('Enter the tear length');
    expect((await shot({ tear: 'left', lengthMm: 15, changedBefore: 'nock-height', changeNote: 'down 1/16' })).status).toBe(201);
    expect((await archer.agent.post(`/api/paper-tunes/${runId}/end`).set(CSRF).send({ outcome: 'clean' })).status).toBe(400);
    expect((await shot({ tear: 'left', lengthMm: 6, changedBefore: 'rest', changeNote: 'left 1/32' })).status).toBe(201);
    const last = await shot({ tear: 'clean', lengthMm: 40, changedBefore: 'rest', changeNote: 'left 1/32' });
    expect(last.body.run.shots).toHaveLength(4);
    expect(last.body.run.shots[3]).toMatchObject({ tear: 'clean', lengthMm: null, position: 3 });
    const end = await archer.agent.post(`/api/paper-tunes/${runId}/end`).set(CSRF).send({ outcome: 'clean' });
    expect(end.status).toBe(200);
    expect(end.body.run.outcome).toBe('clean');
    expect((await shot({ tear: 'clean' })).status).toBe(409);
    const changes = (await archer.agent.get(`/api/bows/${bow.id}/changes`)).body.changes.map((c: { kind: string }) => c.kind);
    expect(changes.sort()).toEqual(['nock-height', 'rest', 'rest']);
    // The export carries it.
    const json = await archer.agent.get(`/api/bows/${bow.id}/export.json`);
    expect(json.body.paperTuneRuns[0].shots).toHaveLength(4);
    const csv = await archer.agent.get(`/api/bows/${bow.id}/tuning.csv`);
    expect(csv.text.split('\r\n')[0]).toBe('bow,record,record_id,date,item,value_mm,choice,weight_gr,detail,added_by');
    expect(csv.text).toContain('paper-tune-end');
  });

  test('a technician cannot add shots to the archer’s run but may start their own', async () => {
    const archer = await signedInAgent(app);
    const { bow } = await bowWithBuild(archer.agent);
    const tech = await shareWith(archer, bow.id);
    const run = await archer.agent.post(`/api/bows/${bow.id}/paper-tunes`).set(CSRF).send({ distance: 5, unit: 'yd', startedOn: today() });
    expect((await tech.agent.post(`/api/paper-tunes/${run.body.run.id}/shots`).set(CSRF).send({ tear: 'clean' })).status).toBe(403);
    const own = await tech.agent.post(`/api/bows/${bow.id}/paper-tunes`).set(CSRF).send({ distance: 4, unit: 'm', startedOn: today() });
    expect(own.status).toBe(201);
    expect(own.body.run.byTechnician).toBe(true);
    const bad = await tech.agent.post(`/api/bows/${bow.id}/paper-tunes`).set(CSRF).send({ distance: 0, unit: 'yd', startedOn: today() });
    expect(bad.body.error.fields.distance).toBe('Distance to the paper must be at least 1');
  });
});

describe('arrow sets', () => {
  test('a set of six with one heavy arrow; a flier counted per arrow; validation names the arrow', async () => {
    const archer = await signedInAgent(app);
    const { bow, build, sightIn } = await bowWithSightIn(archer.agent, [20, 40, 60]);
    const arrows = [500.2, 499.8, 500.5, 506.0, 499.9, 500.1].map((weightGr, index) => ({
      number: index + 1,
      weightGr,
      spinKind: 'thou',
      runout: 2,
    }));
    const dup = await archer.agent
      .post(`/api/builds/${build.id}/arrow-sets`)
      .set(CSRF)
      .send({ name: 'Hunting six', arrows: [...arrows, { number: 2, weightGr: 500 }] });
    expect(dup.status).toBe(400);
    expect(dup.body.error.fields['arrows.6.number']).toBe('Arrow 2 is numbered twice');
    const badRunout = await archer.agent
      .post(`/api/builds/${build.id}/arrow-sets`)
      .set(CSRF)
      .send({ name: 'x', arrows: [{ number: 1, weightGr: 500, spinKind: 'mm' }] });
    expect(badRunout.body.error.fields['arrows.0.runout']).toBe('Enter the runout in mm');
    const made = await archer.agent.post(`/api/builds/${build.id}/arrow-sets`).set(CSRF).send({ name: 'Hunting six', arrows });
    expect(made.status).toBe(201);
    expect(made.body.set.toleranceGr).toBe(2);
    expect(made.body.set.arrows).toHaveLength(6);
    expect(made.body.set.buildTotalGr).toEqual(expect.any(Number));
    const four = made.body.set.arrows.find((a: { number: number }) => a.number === 4);
    const flier = await archer.agent.post(`/api/arrows/${four.id}/fliers`).set(CSRF).send({ sightInId: sightIn.id });
    expect(flier.status).toBe(201);
    expect(flier.body.set.arrows.find((a: { number: number }) => a.number === 4).fliers).toHaveLength(1);
    expect((await archer.agent.post(`/api/arrows/${four.id}/fliers`).set(CSRF).send({ sightInId: sightIn.id })).status).toBe(409);
    const retired = await archer.agent.patch(`/api/arrows/${four.id}`).set(CSRF).send({ status: 'retired' });
    expect(retired.body.set.arrows.find((a: { number: number }) => a.number === 4).status).toBe('retired');
    // Another bow's sight-in is refused.
    const other = await bowWithSightIn(archer.agent, [20, 40]);
    expect((await archer.agent.post(`/api/arrows/${four.id}/fliers`).set(CSRF).send({ sightInId: other.sightIn.id })).status).toBe(400);
    const json = await archer.agent.get(`/api/bows/${bow.id}/export.json`);
    expect(json.body.arrowSets[0].arrows).toHaveLength(6);
  });
});

describe('demo seed', () => {
  test('the hunting bow gets its invented tuning records once; its tape stays current and its level verified', async () => {
    const seeded = await signedInAgent(app, { name: 'Seed Archer' });
    const archer = (await User.findByPk(seeded.user.id))!;
    await seedBows(archer);
    await seedLevel(archer);
    await seedTuning(archer);
    await seedTuning(archer); // idempotent
    const bow = (await Bow.findOne({ where: { userId: archer.id, nickname: 'Timberline slider' } }))!;
    expect(await SetupEntry.count({ where: { bowId: bow.id } })).toBe(9);
    const runs = (await seeded.agent.get(`/api/bows/${bow.id}/paper-tunes`)).body.runs;
    expect(runs).toHaveLength(1);
    expect(runs[0]).toMatchObject({ outcome: 'clean', distance: 5, unit: 'yd' });
    const detail = (await seeded.agent.get(`/api/bows/${bow.id}`)).body.bow;
    expect(detail.readiness.confirm).toBeNull();
    expect(detail.readiness.level.state).toBe('verified');
    const build = detail.builds.find((b: { name: string }) => b.name === 'Elk heavy');
    const sets = (await seeded.agent.get(`/api/builds/${build.id}/arrow-sets`)).body.sets;
    expect(sets[0].arrows).toHaveLength(6);
  });
});
