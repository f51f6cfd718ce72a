import { DOMParser } from '@xmldom/xmldom';
import { CSRF, closeDb, signedInAgent, testApp } from '../helpers/api';
import { predictResponseSchema } from '@/shared/predict';
import { simulatedReadings } from '@/server/services/fit-service';
import { buildBody, type Agent } from './bow-fixtures';
import { addBuild, addSightIn, bowWithTwoBuilds, sightFor, trueSpeedFps } from './build-tools-fixtures';

const app = testApp();
afterAll(closeDb);
// Sign-ups (bcrypt) and fits: slow when the API test files run in parallel on two cores.
jest.setTimeout(30_000);

/** A build of neither weight yet: 150 gr point, 75 gr brass insert, 6.2 mm shaft (≈ 525 gr). */
const newBuild = buildBody({ name: 'Elk brass', insertGr: 75, speedFps: null });

const asBuffer = (res: NodeJS.ReadableStream, done: (err: Error | null, body: Buffer) => void) => {
  const chunks: Buffer[] = [];
  res.on('data', (chunk: Buffer) => chunks.push(chunk));
  res.on('end', () => done(null, Buffer.concat(chunks)));
};
const download = (agent: Agent, url: string) =>
  agent
    .get(url)
    .buffer(true)
    .parse(asBuffer as never);

describe('POST /api/bows/:bowId/predict', () => {
  it('predicts a new build’s speed within 1 fps from two chronographed builds, and its marks on the bow’s fitted sight', async () => {
    const { agent } = await signedInAgent(app);
    const { bowId, heavy, light, lightSightIn } = await bowWithTwoBuilds(agent);
    const res = await agent.post(`/api/bows/${bowId}/predict`).set(CSRF).send({ build: newBuild, sightInId: lightSightIn.id });
    expect(res.status).toBe(200);
    const body = predictResponseSchema.parse(res.body);
    expect(body.chronographed.map((build) => build.buildId)).toEqual([heavy.id, light.id]);
    expect(body.build.buildId).toBeNull();
    expect(body.build.totalGr).toBeCloseTo(heavy.derived.totalGr + 25, 9);
    const { prediction } = body;
    expect(prediction.speedSource).toBe('virtual-mass');
    // The invented bow follows v = √(2E/(m + m_v)) exactly, so two builds recover it: within 1 fps of the truth.
    expect(Math.abs(prediction.speedFps - trueSpeedFps(body.build.totalGr))).toBeLessThan(1);
    expect(prediction.virtualMass!.energyJ).toBeCloseTo(190, 3);
    expect(prediction.virtualMass!.virtualMassGr).toBeCloseTo(300, 2);
    expect(prediction.caution).toBe('PREDICTED — not sighted. Confirm at the range before relying on it.');
    expect(prediction.warnings.join(' ')).toMatch(/heavier than every chronographed build/);
    expect(body.sightIn).toMatchObject({ id: lightSightIn.id, buildName: 'Test light' });
    expect(body.marksMissing).toBeNull();

    // The marks the new arrow really needs on that sight (the marks' own sight, carrying the new arrow at its true speed).
    const truth = sightFor({ id: 0, name: '', derived: { totalGr: body.build.totalGr }, diameterMm: 6.2 });
    const distances = [20, 30, 40, 50, 60];
    const truthMarks = simulatedReadings(truth, distances);
    for (const [k, distance] of distances.entries()) {
      const mark = prediction.marks!.find((candidate) => candidate.distance === distance)!;
      // Within 0.3 mm: the sight-in's marks were read to 0.1 mm, so its fitted geometry carries that rounding.
      expect(Math.abs(mark.markMm! - truthMarks[k])).toBeLessThan(0.3);
      expect(mark.differenceMm!).toBeCloseTo(mark.markMm! - mark.sightedBuildMarkMm!, 9);
      expect(mark.differenceMm!).toBeGreaterThan(0);
    }
    expect(body.model).not.toBeNull();
  });

  it('uses a saved build’s own chronographed speed, and leaves it out of the fit', async () => {
    const { agent } = await signedInAgent(app);
    const { bowId, heavy } = await bowWithTwoBuilds(agent);
    const res = await agent.post(`/api/bows/${bowId}/predict`).set(CSRF).send({ buildId: heavy.id });
    expect(res.status).toBe(200);
    expect(res.body.prediction.speedSource).toBe('chronograph');
    expect(res.body.prediction.speedFps).toBeCloseTo(trueSpeedFps(heavy.derived.totalGr), 9);
    expect(res.body.chronographed.map((build: { buildId: number }) => build.buildId)).not.toContain(heavy.id);
  });

  it('says what is missing with one chronographed build instead of guessing', async () => {
    const { agent } = await signedInAgent(app);
    const { bowId, heavy } = await bowWithTwoBuilds(agent, { chronographed: false });
    await agent.patch(`/api/builds/${heavy.id}`).set(CSRF).send({ speedFps: 280 });
    const res = await agent.post(`/api/bows/${bowId}/predict`).set(CSRF).send({ build: newBuild });
    expect(res.status).toBe(400);
    expect(res.body.error.message).toMatch(/^Chronograph at least one more build on this bow/);
    expect(res.body.error.fields.builds).toBe(res.body.error.message);
  });

  it('gives the speed alone, saying why there are no marks, on a bow without a sight-in', async () => {
    const { agent } = await signedInAgent(app);
    const { bowId } = await bowWithTwoBuilds(agent, { sightIns: false });
    const res = await agent.post(`/api/bows/${bowId}/predict`).set(CSRF).send({ build: newBuild });
    expect(res.status).toBe(200);
    expect(res.body.prediction.marks).toBeNull();
    expect(res.body.marksMissing).toMatch(/^Sight in any build on this bow to predict marks/);
    const tape = await agent.get(
      `/api/bows/${bowId}/predict/tape.svg?insertGr=75&grainsPerInch=9.3&cutLengthMm=717.55&diameterMm=6.2&pointGr=150`,
    );
    expect(tape.status).toBe(409);
  });

  it('checks the body with field messages', async () => {
    const { agent } = await signedInAgent(app);
    const { bowId, heavy } = await bowWithTwoBuilds(agent, { sightIns: false });
    const other = await bowWithTwoBuilds(agent, { sightIns: false });
    const cases: [unknown, Record<string, string>][] = [
      [{}, { buildId: 'Choose a saved build or enter a new one (one of the two)' }],
      [{ buildId: heavy.id, build: newBuild }, { buildId: 'Choose a saved build or enter a new one (one of the two)' }],
      [{ build: { ...newBuild, grainsPerInch: 1 } }, { 'build.grainsPerInch': 'Grains per inch must be at least 2 gpi' }],
      [{ buildId: 'seven' }, { buildId: 'Choose the arrow build' }],
      [{ buildId: heavy.id, colour: 'red' }, { _: 'Send a buildId or a build, and optionally a sightInId' }],
    ];
    for (const [body, fields] of cases) {
      const res = await agent
        .post(`/api/bows/${bowId}/predict`)
        .set(CSRF)
        .send(body as object);
      expect({ body, status: res.status, fields: res.body.error?.fields }).toEqual({ body, status: 400, fields });
    }
    const foreign = await agent.post(`/api/bows/${bowId}/predict`).set(CSRF).send({ buildId: other.light.id });
    expect(foreign.body.error.fields).toEqual({ buildId: 'Choose one of this bow’s arrow builds' });
    const sightIn = await agent.post(`/api/bows/${bowId}/predict`).set(CSRF).send({ buildId: heavy.id, sightInId: 999999999 });
    expect(sightIn.body.error.fields).toEqual({ sightInId: 'Choose one of this bow’s sight-ins' });
    expect((await agent.post(`/api/bows/${bowId}/predict`).send({ buildId: heavy.id })).status).toBe(403); // no CSRF header
  });

  it('hides another account’s bow (404), for the prediction and its tape', async () => {
    const { agent } = await signedInAgent(app);
    const { bowId, heavy } = await bowWithTwoBuilds(agent);
    const { agent: stranger } = await signedInAgent(app);
    const res = await stranger.post(`/api/bows/${bowId}/predict`).set(CSRF).send({ buildId: heavy.id });
    expect(res.status).toBe(404);
    expect(res.body.error.message).toBe('That bow was not found.');
    expect((await stranger.get(`/api/bows/${bowId}/predict/tape.svg?buildId=${heavy.id}`)).status).toBe(404);
  });
});

describe('GET /api/bows/:bowId/predict/tape.svg', () => {
  it('draws the predicted tape true to the predicted marks, marked PREDICTED — not sighted, outlines only', async () => {
    const { agent } = await signedInAgent(app);
    const { bowId, lightSightIn } = await bowWithTwoBuilds(agent);
    const query =
      'name=Elk%20brass&grainsPerInch=9.3&cutLengthMm=717.55&diameterMm=6.2&pointGr=150&insertGr=75&nockGr=9&vaneCount=3&vaneWeightGr=7&wrapGr=8';
    const res = await download(agent, `/api/bows/${bowId}/predict/tape.svg?${query}&sightInId=${lightSightIn.id}&from=20&to=60`);
    expect(res.status).toBe(200);
    expect(res.headers['content-type']).toMatch(/^image\/svg\+xml/);
    expect(res.headers['content-disposition']).toMatch(/predicted-tape-elk-brass\.svg/);
    const text = res.body.toString('utf8');
    const doc = new DOMParser().parseFromString(text, 'image/svg+xml');
    const svg = doc.documentElement!;
    expect(svg.getAttribute('width')).toMatch(/mm$/);
    expect(svg.getAttribute('data-predicted')).toBe('true');
    expect(doc.getElementsByTagName('text').length).toBe(0);
    const labels = Array.from(doc.getElementsByTagName('path') as unknown as ArrayLike<Element>).map(
      (path) => path.getAttribute('aria-label') ?? '',
    );
    expect(labels.join(' ')).toContain('PREDICTED — not sighted.');
    expect(labels).toContain('PREDICTED · NOT SIGHTED');

    // The tick spacing is the predicted marks' spacing (the JSON prediction of the same build on the same sight-in).
    const body = (
      await agent
        .post(`/api/bows/${bowId}/predict`)
        .set(CSRF)
        .send({ build: { ...newBuild, insertGr: 75, nockGr: 9, vaneCount: 3, vaneWeightGr: 7, wrapGr: 8 }, sightInId: lightSightIn.id })
    ).body;
    const mark = (distance: number) =>
      body.prediction.marks.find((candidate: { distance: number }) => candidate.distance === distance).markMm;
    const ticks = new Map<number, number>();
    const lines = doc.getElementsByTagName('line');
    for (let i = 0; i < lines.length; i++) {
      const distance = lines[i].getAttribute('data-distance');
      if (distance !== null) ticks.set(Number(distance), Number(lines[i].getAttribute('y1')));
    }
    expect(ticks.size).toBe(41);
    for (const distance of [30, 40, 50, 60])
      expect(Math.abs(ticks.get(distance)! - ticks.get(20)! - (mark(distance) - mark(20)))).toBeLessThan(0.001);
  });

  it('checks the query, and refuses a build without what it needs', async () => {
    const { agent } = await signedInAgent(app);
    const { bowId } = await bowWithTwoBuilds(agent);
    const missing = await agent.get(`/api/bows/${bowId}/predict/tape.svg?grainsPerInch=9.3`);
    expect(missing.status).toBe(400);
    expect(missing.body.error.fields['query.cutLengthMm']).toBe('Enter the cut length');
    const backwards = await agent.get(`/api/bows/${bowId}/predict/tape.svg?buildId=1&from=60&to=20`);
    expect(backwards.body.error.fields).toEqual({ 'query.to': 'To distance must be beyond the from distance' });
    const single = await bowWithTwoBuilds(agent, { chronographed: false });
    await addSightIn(agent, single.bowId, await addBuild(agent, single.bowId, { name: 'Third' }, true));
    const refused = await agent.get(`/api/bows/${single.bowId}/predict/tape.svg?buildId=${single.light.id}`);
    expect(refused.status).toBe(400);
    expect(refused.body.error.message).toMatch(/^Chronograph at least one more build on this bow/);
  });
});
