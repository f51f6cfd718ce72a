import { CSRF, closeDb, signedInAgent, testApp } from '@/tests/helpers/api';
import { bowBody, bowWithSightIn, buildBody, knownMarks } from '@/tests/api/bow-fixtures';
import { AuditEntry, Share, User } from '@/server/models';

const app = testApp();

afterAll(closeDb);

/** An archer with a bow (one build, one sight-in) shared with a technician through an active share. */
async function sharedBow() {
  const archer = await signedInAgent(app, { name: 'Ilse Brackenridge' });
  const tech = await signedInAgent(app, { name: 'Oren Hallowfield' });
  await User.update({ role: 'tech' }, { where: { id: tech.user.id } });
  const made = await bowWithSightIn(archer.agent, [20, 40, 60]);
  const share = await Share.create({
    bowId: made.bow.id,
    archerId: archer.user.id,
    techId: tech.user.id,
    invitedEmail: tech.email,
    state: 'active',
    acceptedAt: new Date(),
    revokedAt: null,
  });
  return { archer, tech, share, ...made };
}

describe('a technician adds an arrow build to a shared bow', () => {
  it('adds it as a new entry, attributed, that the archer sees and the audit log records', async () => {
    const { archer, tech, bow, build } = await sharedBow();
    const added = await tech.agent
      .post(`/api/bows/${bow.id}/builds`)
      .set(CSRF)
      .send(buildBody({ name: 'Shop test 480', pointGr: 100 }));
    expect(added.status).toBe(201);
    expect(added.body.build).toMatchObject({
      bowId: bow.id,
      name: 'Shop test 480',
      addedBy: { id: tech.user.id, name: 'Oren Hallowfield' },
    });

    // The archer sees it on the bow, beside their own build, each naming who added it.
    const detail = await archer.agent.get(`/api/bows/${bow.id}`);
    expect(detail.status).toBe(200);
    const byName = Object.fromEntries(detail.body.bow.builds.map((b: { name: string; addedBy: unknown }) => [b.name, b.addedBy]));
    expect(byName['Shop test 480']).toEqual({ id: tech.user.id, name: 'Oren Hallowfield' });
    expect(byName[build.name]).toEqual({ id: archer.user.id, name: 'Ilse Brackenridge' });
    const listed = await archer.agent.get(`/api/bows/${bow.id}/builds`);
    expect(listed.body.builds.find((b: { id: number }) => b.id === added.body.build.id).addedBy.name).toBe('Oren Hallowfield');

    // The audit log names the technician and the build.
    const entries = await AuditEntry.findAll({ where: { bowId: bow.id, recordType: 'arrow-build' } });
    expect(entries).toHaveLength(1);
    expect(entries[0]).toMatchObject({ actorId: tech.user.id, action: 'created', recordId: added.body.build.id });
    expect(entries[0].summary).toContain('Shop test 480');
  });

  it('never changes or deletes a build, the archer’s or its own', async () => {
    const { tech, build, bow } = await sharedBow();
    expect((await tech.agent.patch(`/api/builds/${build.id}`).set(CSRF).send({ name: 'Renamed' })).status).toBe(403);
    expect((await tech.agent.delete(`/api/builds/${build.id}`).set(CSRF)).status).toBe(403);
    const own = await tech.agent
      .post(`/api/bows/${bow.id}/builds`)
      .set(CSRF)
      .send(buildBody({ name: 'Mine' }));
    expect(own.status).toBe(201);
    expect((await tech.agent.patch(`/api/builds/${own.body.build.id}`).set(CSRF).send({ name: 'Renamed' })).status).toBe(403);
    expect((await tech.agent.delete(`/api/builds/${own.body.build.id}`).set(CSRF)).status).toBe(403);
  });

  it('is refused once the archer revokes the share, and on a bow never shared (404, nothing written)', async () => {
    const { archer, tech, bow, share } = await sharedBow();
    const revoked = await archer.agent.post(`/api/shares/${share.id}/revoke`).set(CSRF);
    expect(revoked.status).toBe(200);
    const after = await tech.agent
      .post(`/api/bows/${bow.id}/builds`)
      .set(CSRF)
      .send(buildBody({ name: 'Too late' }));
    expect(after.status).toBe(404);

    const other = await signedInAgent(app, { name: 'Unshared Archer' });
    const unshared = await other.agent
      .post('/api/bows')
      .set(CSRF)
      .send(bowBody({ nickname: 'Not shared' }));
    const refused = await tech.agent
      .post(`/api/bows/${unshared.body.bow.id}/builds`)
      .set(CSRF)
      .send(buildBody({ name: 'Sneaky' }));
    expect(refused.status).toBe(404);

    const names = (await archer.agent.get(`/api/bows/${bow.id}/builds`)).body.builds.map((b: { name: string }) => b.name);
    expect(names).not.toContain('Too late');
    expect((await other.agent.get(`/api/bows/${unshared.body.bow.id}/builds`)).body.builds).toEqual([]);
  });

  it('still checks the build like the archer’s own (a field error names the field)', async () => {
    const { tech, bow } = await sharedBow();
    const bad = await tech.agent
      .post(`/api/bows/${bow.id}/builds`)
      .set(CSRF)
      .send(buildBody({ name: 'Bad', grainsPerInch: -3 }));
    expect(bad.status).toBe(400);
    expect(Object.keys(bad.body.error.fields)).toContain('grainsPerInch');
  });
});

describe('who added each mark and sight-in', () => {
  it('names the technician on the marks they add, and keeps it when the archer saves the sight-in again', async () => {
    const { archer, tech, sightIn, bow } = await sharedBow();
    expect(sightIn.addedBy).toEqual({ id: archer.user.id, name: 'Ilse Brackenridge' });
    expect(sightIn.marks.every((mark: { addedBy: unknown }) => (mark.addedBy as { id: number }).id === archer.user.id)).toBe(true);

    const stored = sightIn.marks.map(({ distance, unit, scaleMm, arrowsShot, note }: Record<string, unknown>) => ({
      distance,
      unit,
      scaleMm,
      arrowsShot,
      note,
    }));
    const extra = knownMarks([50])[0];
    const appended = await tech.agent
      .patch(`/api/sight-ins/${sightIn.id}`)
      .set(CSRF)
      .send({ marks: [...stored, extra] });
    expect(appended.status).toBe(200);
    const techMark = appended.body.sightIn.marks.find((mark: { distance: number }) => mark.distance === 50);
    expect(techMark.addedBy).toEqual({ id: tech.user.id, name: 'Oren Hallowfield' });

    // The archer edits the note of a sight-in and saves all marks back: each keeps who added it.
    const again = await archer.agent
      .patch(`/api/sight-ins/${sightIn.id}`)
      .set(CSRF)
      .send({
        notes: 'Windy',
        marks: appended.body.sightIn.marks.map(({ distance, unit, scaleMm, arrowsShot, note }: Record<string, unknown>) => ({
          distance,
          unit,
          scaleMm,
          arrowsShot,
          note,
        })),
      });
    expect(again.status).toBe(200);
    const byDistance = Object.fromEntries(
      again.body.sightIn.marks.map((mark: { distance: number; addedBy: { name: string } }) => [mark.distance, mark.addedBy.name]),
    );
    expect(byDistance).toEqual({ 20: 'Ilse Brackenridge', 40: 'Ilse Brackenridge', 60: 'Ilse Brackenridge', 50: 'Oren Hallowfield' });

    // A sight-in the technician adds is theirs in the bow's list.
    const techSightIn = await tech.agent
      .post(`/api/bows/${bow.id}/sight-ins`)
      .set(CSRF)
      .send({ buildId: sightIn.buildId, date: '2026-11-30', placeLabel: 'Shop lane', marks: knownMarks([20, 30]) });
    expect(techSightIn.status).toBe(201);
    const list = (await archer.agent.get(`/api/bows/${bow.id}/sight-ins`)).body.sightIns;
    expect(list.find((s: { id: number }) => s.id === techSightIn.body.sightIn.id).addedBy.name).toBe('Oren Hallowfield');
  });
});

describe('set-up changes a technician records (engineer E’s set-up measures)', () => {
  it('adds a new peep height entry on a shared bow, attributed to the technician, that the archer reads; never on an unshared bow', async () => {
    const { archer, tech, bow, share } = await sharedBow();
    const added = await tech.agent
      .post(`/api/bows/${bow.id}/setup`)
      .set(CSRF)
      .send({ measure: 'peep-height', valueMm: 113, measuredOn: '2026-12-01', note: 'Peep moved up after the new string' });
    expect(added.status).toBe(201);
    const read = await archer.agent.get(`/api/bows/${bow.id}/setup`);
    expect(read.status).toBe(200);
    const entry = read.body.entries.find((e: { id: number }) => e.id === added.body.entry.id);
    expect(entry).toMatchObject({ measure: 'peep-height', addedBy: { id: tech.user.id, name: 'Oren Hallowfield' }, byTechnician: true });

    await archer.agent.post(`/api/shares/${share.id}/revoke`).set(CSRF);
    const refused = await tech.agent
      .post(`/api/bows/${bow.id}/setup`)
      .set(CSRF)
      .send({ measure: 'peep-height', valueMm: 114, measuredOn: '2026-12-01', note: '' });
    expect(refused.status).toBe(404);
  });

  it('records a new sight radius as the technician’s own entry; the archer’s bow is not edited, and a typo is refused', async () => {
    const { archer, tech, bow } = await sharedBow();
    const before = (await archer.agent.get(`/api/bows/${bow.id}`)).body.bow.sightRadiusMm;
    const typo = await tech.agent
      .post(`/api/bows/${bow.id}/setup`)
      .set(CSRF)
      .send({ measure: 'sight-radius', valueMm: 8400, measuredOn: '2026-12-01', note: '' });
    expect(typo.status).toBe(400);
    expect(typo.body.error.fields.valueMm).toBe('Sight radius must be between 400 and 1200 mm');
    const added = await tech.agent
      .post(`/api/bows/${bow.id}/setup`)
      .set(CSRF)
      .send({ measure: 'sight-radius', valueMm: 860, measuredOn: '2026-12-01', note: 'Longer sight bar fitted' });
    expect(added.status).toBe(201);
    const read = await archer.agent.get(`/api/bows/${bow.id}/setup`);
    expect(read.body.latest['sight-radius']).toMatchObject({
      valueMm: 860,
      addedBy: { id: tech.user.id, name: 'Oren Hallowfield' },
      byTechnician: true,
    });
    // The archer's own set-up (what the fit uses) is unchanged: the technician adds, never edits.
    expect((await archer.agent.get(`/api/bows/${bow.id}`)).body.bow.sightRadiusMm).toBe(before);
  });
});
