import { CSRF, closeDb, signedInAgent, testApp } from '@/tests/helpers/api';
import { bowWithBuild, buildBody, knownMarks, type Agent } from '@/tests/api/bow-fixtures';
import { tripByBuildSchema } from '@/shared/trip';

const app = testApp();

afterAll(closeDb);

async function sightIn(agent: Agent, bowId: number, buildId: number, date: string, distances: number[], placeLabel = 'Larch Hollow range') {
  const res = await agent
    .post(`/api/bows/${bowId}/sight-ins`)
    .set(CSRF)
    .send({ buildId, date, placeLabel, marks: knownMarks(distances) });
  if (res.status !== 201) throw new Error(`sight-in: ${res.status} ${JSON.stringify(res.body)}`);
  return res.body.sightIn as { id: number };
}

async function tape(agent: Agent, sightInId: number, toDistance: number) {
  const res = await agent.post(`/api/sight-ins/${sightInId}/tapes`).set(CSRF).send({ fromDistance: 20, toDistance });
  if (res.status !== 201) throw new Error(`tape: ${res.status} ${JSON.stringify(res.body)}`);
  return res.body.tape as { id: number };
}

describe('Before a trip, build by build', () => {
  it('checks each build’s latest tape against its own sight-ins only, and names two sight-ins of one day apart', async () => {
    const { agent } = await signedInAgent(app, { name: 'Trip Two Builds' });
    const { bow, build: heavy } = await bowWithBuild(agent, { nickname: 'Two-build slider' }, { name: 'Elk heavy' });
    const light = (
      await agent
        .post(`/api/bows/${bow.id}/builds`)
        .set(CSRF)
        .send(buildBody({ name: 'Practice light', pointGr: 85 }))
    ).body.build;

    // Heavy: an older sight-in with a tape, then a newer one without.
    const heavyOld = await sightIn(agent, bow.id, heavy.id, '2026-11-01', [20, 40, 60]);
    await tape(agent, heavyOld.id, 60);
    const heavyNew = await sightIn(agent, bow.id, heavy.id, '2026-11-25', [20, 40, 60], 'Quarry Bend');
    // Light: sighted in twice on one day (the later one the latest overall), tape from the later one.
    await sightIn(agent, bow.id, light.id, '2026-11-28', [20, 30, 40], 'Larch Hollow range');
    const lightLate = await sightIn(agent, bow.id, light.id, '2026-11-28', [20, 30, 40, 50], 'Larch Hollow range');
    await tape(agent, lightLate.id, 50);

    const res = await agent.get(`/api/bows/${bow.id}/readiness`);
    expect(res.status).toBe(200);
    const trip = tripByBuildSchema.parse(res.body);
    expect(trip.builds.map((part) => part.build.name)).toEqual(['Practice light', 'Elk heavy']);
    const [lightPart, heavyPart] = trip.builds;

    // Light's tape is from its own latest sight-in; nothing about reprinting.
    expect(lightPart.tape).toMatchObject({ sightInId: lightLate.id, fromLatestSightIn: true });
    expect(lightPart.warnings.join(' ')).not.toMatch(/older sight-in/);
    // Heavy's tape is its own older one (never light's newer sight-in), and it says to reprint from heavy's latest.
    expect(heavyPart.tape).toMatchObject({ sightInId: heavyOld.id, fromLatestSightIn: false });
    expect(heavyPart.marks?.sightInId).toBe(heavyNew.id);
    expect(heavyPart.warnings).toContain(
      'The saved tape was printed from an older sight-in (1 Nov 2026 · Larch Hollow range · Elk heavy); print one from the latest marks (25 Nov 2026 · Quarry Bend · Elk heavy).',
    );
    // No warning anywhere names one build's tape with the other build's sight-in.
    for (const warning of heavyPart.warnings) expect(warning).not.toContain('Practice light');
    for (const warning of lightPart.warnings) expect(warning).not.toContain('Elk heavy');

    // Two sight-ins of 28 Nov: the name carries the time, so they differ.
    expect(lightPart.marks?.name).toMatch(/^28 Nov 2026, \d\d:\d\d UTC · Larch Hollow range · Practice light/);
    expect(lightPart.tape?.sightInName).toBe(lightPart.marks?.name);

    // The older single-build fields follow the build of the latest sight-in; the bow's own warnings stand apart.
    expect(trip.marks).toMatchObject({ sightInId: lightLate.id, buildName: 'Practice light' });
    expect(trip.tape).toMatchObject({ sightInId: lightLate.id, fromLatestSightIn: true });
    expect(trip.bowWarnings).toEqual(['Level: Never checked.']);
    expect(trip.warnings).toContain(`Elk heavy: ${heavyPart.warnings.find((w) => w.startsWith('The saved tape'))}`);
  });

  it('lists a build never sighted in without inventing a tape for it', async () => {
    const { agent } = await signedInAgent(app, { name: 'Trip Unsighted' });
    const { bow, build } = await bowWithBuild(agent, { nickname: 'One sighted' }, { name: 'Sighted' });
    await agent
      .post(`/api/bows/${bow.id}/builds`)
      .set(CSRF)
      .send(buildBody({ name: 'Never shot' }));
    const only = await sightIn(agent, bow.id, build.id, '2026-11-10', [20, 40]);
    const trip = tripByBuildSchema.parse((await agent.get(`/api/bows/${bow.id}/readiness`)).body);
    expect(trip.builds).toHaveLength(2);
    expect(trip.builds[0]).toMatchObject({ build: { name: 'Sighted' }, marks: { sightInId: only.id }, tape: null });
    expect(trip.builds[0].warnings).toContain('No tape saved for this build yet.');
    expect(trip.builds[1]).toMatchObject({ build: { name: 'Never shot' }, marks: null, tape: null });
  });
});
