import request from 'supertest';
import { CSRF, closeDb, signedInAgent, testApp } from '../helpers/api';
import { ArrowBuild, SightIn } from '@/server/models';
import { buildSchema } from '@/shared/build';
import { focPercent, kineticEnergy, momentum, totalArrowGrains, tradeKineticEnergyFtLbf } from '@/math/arrow';
import { bowBody, buildBody, bowWithSightIn } from './bow-fixtures';

const app = testApp();
afterAll(closeDb);
// Sign-ups (bcrypt), fits and PDFs: slow when the API test files run in parallel on two cores.
jest.setTimeout(30_000);

async function newBow(agent: ReturnType<typeof request.agent>) {
  const res = await agent.post('/api/bows').set(CSRF).send(bowBody());
  return res.body.bow as { id: number };
}

describe('POST /api/bows/:bowId/builds', () => {
  it('names each field problem in plain words and writes nothing', async () => {
    const { agent } = await signedInAgent(app);
    const bow = await newBow(agent);
    const res = await agent
      .post(`/api/bows/${bow.id}/builds`)
      .set(CSRF)
      .send(buildBody({ name: '', grainsPerInch: undefined, diameterMm: 20, vaneCount: 2.5, speedFps: 900 }));
    expect(res.status).toBe(400);
    expect(res.body.error.fields).toEqual({
      name: 'Enter the build name',
      grainsPerInch: 'Enter the grains per inch',
      diameterMm: 'Diameter must be at most 12 mm',
      vaneCount: 'Number of vanes must be a whole number',
      speedFps: 'Chronographed speed must be at most 450 fps',
    });
    const balance = await agent
      .post(`/api/bows/${bow.id}/builds`)
      .set(CSRF)
      .send(buildBody({ balancePointMm: 800, cutLengthMm: 700 }));
    expect(balance.status).toBe(400);
    expect(balance.body.error.fields).toEqual({ balancePointMm: 'Balance point must be shorter than the cut length' });
    expect(await ArrowBuild.count({ where: { bowId: bow.id } })).toBe(0);
  });

  it('stores total grains, FOC, kinetic energy and momentum exactly as math/ computes them', async () => {
    const { agent } = await signedInAgent(app);
    const bow = await newBow(agent);
    const body = buildBody({ speedFps: 276 });
    const res = await agent.post(`/api/bows/${bow.id}/builds`).set(CSRF).send(body);
    expect(res.status).toBe(201);
    const build = buildSchema.parse(res.body.build);
    const stored = (await ArrowBuild.findByPk(build.id))!;

    const cutLengthIn = body.cutLengthMm / 25.4; // 1 in = 25.4 mm exactly (international yard and pound, 1959)
    const totalGr = totalArrowGrains({
      shaftGpi: 9.3,
      cutLengthIn,
      pointGr: 150,
      insertGr: 50,
      nockGr: 9,
      vaneCount: 3,
      vaneGr: 7,
      wrapGr: 8,
      collarGr: 0,
    });
    const energy = kineticEnergy({ massGr: totalGr, speedFps: 276 });
    const impulse = momentum({ massGr: totalGr, speedFps: 276 });
    expect(stored.totalGr).toBeCloseTo(totalGr, 9);
    expect(stored.focPct).toBeCloseTo(focPercent({ balancePoint: 442, arrowLength: body.cutLengthMm }), 9);
    expect(stored.kineticEnergyFtLb).toBeCloseTo(energy.footPounds, 9);
    expect(stored.kineticEnergyJ).toBeCloseTo(energy.joules, 9);
    expect(stored.momentumSlugFtPerS).toBeCloseTo(impulse.slugFeetPerSecond, 9);
    expect(stored.momentumKgMPerS).toBeCloseTo(impulse.kilogramMetresPerSecond, 9);
    expect(build.derived.totalGr).toBeCloseTo(stored.totalGr, 9);

    // Outside values. Arithmetic: 9.3 gr/in × 28.25 in = 262.725 gr of shaft, + 150 + 50 + 9 + 3×7 + 8 = 500.725 gr.
    expect(stored.totalGr).toBeCloseTo(500.725, 6);
    // Exact definitions (international yard and pound, 1959): 1 gr = 64.79891 mg, 1 ft = 0.3048 m; KE = ½mv².
    const joules = 0.5 * 500.725 * 64.79891e-6 * (276 * 0.3048) ** 2;
    expect(stored.kineticEnergyJ).toBeCloseTo(joules, 6);
    // The trade's shortcut grains × fps² / 450,240 (common practice, no published source) agrees within 0.04 %.
    expect(Math.abs(tradeKineticEnergyFtLbf({ massGr: 500.725, speedFps: 276 }) / stored.kineticEnergyFtLb! - 1)).toBeLessThan(0.0005);
    // FOC = 100·(B − L/2)/L (common practice, no published source): (442 − 358.775)/717.55.
    expect(stored.focPct).toBeCloseTo((100 * (442 - 717.55 / 2)) / 717.55, 9);
  });

  it('leaves energy and momentum empty without a speed, and FOC without a balance point', async () => {
    const { agent } = await signedInAgent(app);
    const bow = await newBow(agent);
    const res = await agent
      .post(`/api/bows/${bow.id}/builds`)
      .set(CSRF)
      .send(buildBody({ speedFps: null, balancePointMm: null }));
    expect(res.status).toBe(201);
    expect(res.body.build.derived).toEqual({
      totalGr: expect.any(Number),
      focPct: null,
      kineticEnergyFtLb: null,
      kineticEnergyJ: null,
      momentumSlugFtPerS: null,
      momentumKgMPerS: null,
    });
  });
});

describe('PATCH /api/builds/:id', () => {
  it('recomputes the derived quantities on every save', async () => {
    const { agent } = await signedInAgent(app);
    const bow = await newBow(agent);
    const made = await agent
      .post(`/api/bows/${bow.id}/builds`)
      .set(CSRF)
      .send(buildBody({ speedFps: 280 }));
    const res = await agent.patch(`/api/builds/${made.body.build.id}`).set(CSRF).send({ pointGr: 125 });
    expect(res.status).toBe(200);
    // 25 gr lighter point: 500.725 − 25 (arithmetic).
    expect(res.body.build.derived.totalGr).toBeCloseTo(475.725, 6);
    const stored = (await ArrowBuild.findByPk(made.body.build.id))!;
    expect(stored.kineticEnergyJ).toBeCloseTo(kineticEnergy({ massGr: 475.725, speedFps: 280 }).joules, 9);

    const bad = await agent.patch(`/api/builds/${made.body.build.id}`).set(CSRF).send({ cutLengthMm: 400 });
    expect(bad.status).toBe(400);
    expect(bad.body.error.fields).toEqual({ balancePointMm: 'Balance point must be shorter than the cut length' });
    expect((await ArrowBuild.findByPk(made.body.build.id))!.cutLengthMm).toBeCloseTo(717.55, 9);
  });
});

describe('GET /api/bows/:bowId/builds and /api/builds/:id', () => {
  it('lists the bow’s builds with how many sight-ins use each', async () => {
    const { agent } = await signedInAgent(app);
    const { bow, build } = await bowWithSightIn(agent, [20, 60]);
    await agent
      .post(`/api/bows/${bow.id}/builds`)
      .set(CSRF)
      .send(buildBody({ name: 'Spare' }));
    const list = await agent.get(`/api/bows/${bow.id}/builds`);
    expect(list.status).toBe(200);
    expect(list.body.builds.map((b: { name: string; sightInCount: number }) => [b.name, b.sightInCount])).toEqual([
      ['Test heavy', 1],
      ['Spare', 0],
    ]);
    const one = await agent.get(`/api/builds/${build.id}`);
    expect(buildSchema.parse(one.body.build)).toMatchObject({ id: build.id, bowId: bow.id, sightInCount: 1 });
  });
});

describe('DELETE /api/builds/:id', () => {
  it('deletes a build no sight-in uses', async () => {
    const { agent } = await signedInAgent(app);
    const bow = await newBow(agent);
    const made = await agent.post(`/api/bows/${bow.id}/builds`).set(CSRF).send(buildBody());
    expect((await agent.delete(`/api/builds/${made.body.build.id}`).set(CSRF)).status).toBe(204);
    expect(await ArrowBuild.count({ where: { id: made.body.build.id } })).toBe(0);
  });

  it('refuses (409) to delete a build that sight-ins use, and keeps both', async () => {
    const { agent } = await signedInAgent(app);
    const { build, sightIn } = await bowWithSightIn(agent, [20, 60]);
    const res = await agent.delete(`/api/builds/${build.id}`).set(CSRF);
    expect(res.status).toBe(409);
    expect(res.body.error).toEqual({
      code: 'conflict',
      message: '1 sight-in uses this arrow build. Delete that sight-in first, or keep the build.',
    });
    expect(await ArrowBuild.count({ where: { id: build.id } })).toBe(1);
    expect(await SightIn.count({ where: { id: sightIn.id } })).toBe(1);
    // Once the sight-in is gone, the build may go.
    expect((await agent.delete(`/api/sight-ins/${sightIn.id}`).set(CSRF)).status).toBe(204);
    expect((await agent.delete(`/api/builds/${build.id}`).set(CSRF)).status).toBe(204);
  });
});

describe('ownership', () => {
  it('gives another account a 404 on every build route, and changes nothing', async () => {
    const owner = await signedInAgent(app);
    const bow = await newBow(owner.agent);
    const made = await owner.agent.post(`/api/bows/${bow.id}/builds`).set(CSRF).send(buildBody());
    const id = made.body.build.id;
    const stranger = (await signedInAgent(app)).agent;
    const responses = [
      [await stranger.get(`/api/bows/${bow.id}/builds`), 'That bow was not found.'],
      [await stranger.post(`/api/bows/${bow.id}/builds`).set(CSRF).send(buildBody()), 'That bow was not found.'],
      [await stranger.get(`/api/builds/${id}`), 'That arrow build was not found.'],
      [await stranger.patch(`/api/builds/${id}`).set(CSRF).send({ name: 'Taken' }), 'That arrow build was not found.'],
      [await stranger.delete(`/api/builds/${id}`).set(CSRF), 'That arrow build was not found.'],
    ] as const;
    for (const [res, message] of responses) {
      expect(res.status).toBe(404);
      expect(res.body.error).toEqual({ code: 'not_found', message });
    }
    expect(await ArrowBuild.count({ where: { bowId: bow.id } })).toBe(1);
    expect((await ArrowBuild.findByPk(id))!.name).toBe('Test heavy');
  });
});
