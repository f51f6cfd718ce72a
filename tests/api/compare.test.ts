import { CSRF, closeDb, signedInAgent, testApp } from '../helpers/api';
import { compareResponseSchema } from '@/shared/compare';
import { fittedReadings } from '@/server/services/fit-service';
import { addBuild, bowWithTwoBuilds, lightBuildFields } from './build-tools-fixtures';

const app = testApp();
afterAll(closeDb);
// Sign-ups (bcrypt) and fits: slow when the API test files run in parallel on two cores.
jest.setTimeout(30_000);

describe('GET /api/bows/:bowId/compare', () => {
  it('lays two sighted builds side by side: marks from each stored fit, differences in mm and in distance, figures', async () => {
    const { agent } = await signedInAgent(app);
    const { bowId, heavy, light, heavySightIn, lightSightIn } = await bowWithTwoBuilds(agent);
    const res = await agent.get(`/api/bows/${bowId}/compare?builds=${light.id},${heavy.id}&at=40`);
    expect(res.status).toBe(200);
    const body = compareResponseSchema.parse(res.body);
    const { comparison, sources } = body;
    expect(sources.map((source) => [source.buildId, source.sightInId, source.markCount])).toEqual([
      [light.id, lightSightIn.id, 3],
      [heavy.id, heavySightIn.id, 3],
    ]);
    expect(comparison.builds.map((build) => build.label)).toEqual(['Test light', 'Test heavy']);
    expect(comparison.unit).toBe('yd');
    expect(comparison.rows.map((row) => row.distance)).toEqual([20, 30, 40, 50, 60, 70, 80]);

    const lightMarks = fittedReadings(lightSightIn.fit, [20, 40, 60]);
    const heavyMarks = fittedReadings(heavySightIn.fit, [20, 40, 60]);
    for (const [k, distance] of [20, 40, 60].entries()) {
      const row = comparison.rows.find((candidate) => candidate.distance === distance)!;
      // Each build's mark is its own stored fit's mark (both come from the model saved with the sight-in).
      expect(row.marks[0].markMm!).toBeCloseTo(lightMarks[k], 9);
      expect(row.marks[1].markMm!).toBeCloseTo(heavyMarks[k], 9);
      expect(row.marks[0].differenceMm!).toBeCloseTo(0, 12);
      expect(row.marks[1].differenceMm!).toBeCloseTo(heavyMarks[k] - lightMarks[k], 9);
      // The heavier, slower arrow needs a lower pin (a larger reading): on the light build's tape it sits further out.
      expect(row.marks[1].differenceMm!).toBeGreaterThan(0);
      expect(row.marks[1].differenceDistance!).toBeCloseTo(row.marks[1].differenceMm! / row.marks[0].slopeMmPerUnit!, 9);
      expect(row.marks[1].differenceDistance!).toBeGreaterThan(0);
    }

    const [lightFigures, heavyFigures] = comparison.builds;
    expect(heavyFigures.massGr).toBeCloseTo(heavy.derived.totalGr, 9);
    expect(heavyFigures.speedFps).toBeLessThan(lightFigures.speedFps);
    expect(heavyFigures.momentumKgMps).toBeGreaterThan(lightFigures.momentumKgMps);
    expect(heavyFigures.drop!.near).toBe(40);
    expect(heavyFigures.drop!.dropMm).toBeGreaterThan(lightFigures.drop!.dropMm);
    expect(heavyFigures.forgiveness!.distance).toBe(40);
    expect(heavyFigures.forgiveness!.windowMm).toBe(100);
    expect(heavyFigures.forgiveness!.span).toBeLessThan(lightFigures.forgiveness!.span);
    expect(lightFigures.focPct).not.toBeNull();
    expect(comparison.caution).toMatch(/no legal determination/);
    expect(comparison.curves).toHaveLength(2);
    expect(comparison.curves[0].points[0]).toEqual({ distance: 10, markMm: expect.any(Number) });
    expect(comparison.commonAirDensityKgM3).toBeNull();
  });

  it('evaluates every build in one air when an altitude is given: thinner air, less drop, long marks up the scale', async () => {
    const { agent } = await signedInAgent(app);
    const { bowId, heavy, light } = await bowWithTwoBuilds(agent);
    const sighted = (await agent.get(`/api/bows/${bowId}/compare?builds=${heavy.id},${light.id}`)).body;
    const high = (await agent.get(`/api/bows/${bowId}/compare?builds=${heavy.id},${light.id}&altitudeM=2700&temperatureC=5`)).body;
    // ISO 2533 troposphere at 2700 m (geopotential ≈ 2698.9 m) with 5 °C is about 0.912 kg/m³ (standard p ≈ 72.8 kPa / (287.053 J/(kg·K) · 278.15 K)).
    expect(high.comparison.commonAirDensityKgM3).toBeGreaterThan(0.9);
    expect(high.comparison.commonAirDensityKgM3).toBeLessThan(0.95);
    const at = (body: typeof high, distance: number) =>
      body.comparison.rows.find((row: { distance: number }) => row.distance === distance).marks[0].markMm;
    expect(at(high, 80)).toBeLessThan(at(sighted, 80));
    expect(high.comparison.builds[0].drop.dropMm).toBeLessThan(sighted.comparison.builds[0].drop.dropMm);
  });

  it('refuses a build without a sight-in, naming it', async () => {
    const { agent } = await signedInAgent(app);
    const { bowId, heavy } = await bowWithTwoBuilds(agent);
    const fresh = await addBuild(agent, bowId, { ...lightBuildFields, name: 'Unshot broadhead build' }, false);
    const res = await agent.get(`/api/bows/${bowId}/compare?builds=${heavy.id},${fresh.id}`);
    expect(res.status).toBe(409);
    expect(res.body.error.message).toBe(
      '“Unshot broadhead build” has no fitted sight-in yet: sight it in (two marks are enough) before comparing.',
    );
    expect(res.body.error.fields.builds).toBe(res.body.error.message);
  });

  it('checks the query with field messages', async () => {
    const { agent } = await signedInAgent(app);
    const { bowId, heavy, light } = await bowWithTwoBuilds(agent, { sightIns: false });
    const cases: [string, Record<string, string>][] = [
      ['', { 'query.builds': 'Choose at least 2 builds to compare' }],
      [`builds=${heavy.id}`, { 'query.builds': 'Choose at least 2 builds to compare' }],
      [`builds=${heavy.id},x`, { 'query.builds.1': 'Each build id must be a number' }],
      [`builds=1,2,3,4,5`, { 'query.builds': 'Compare at most 4 builds at once' }],
      [`builds=${heavy.id},${heavy.id}`, { 'query.builds.1': `Build ${heavy.id} is listed twice` }],
      [`builds=${heavy.id},${light.id}&at=500`, { 'query.at': 'Forgiveness distance must be at most 100' }],
      [`builds=${heavy.id},${light.id}&windowMm=2`, { 'query.windowMm': 'Window must be at least 10 mm' }],
      [
        `builds=${heavy.id},${light.id}&temperatureC=5`,
        { 'query.altitudeM': 'Enter the altitude for a common air (the temperature alone is not enough)' },
      ],
    ];
    for (const [query, fields] of cases) {
      const res = await agent.get(`/api/bows/${bowId}/compare?${query}`);
      expect({ query, status: res.status, fields: res.body.error?.fields }).toEqual({ query, status: 400, fields });
    }
  });

  it('refuses builds of another bow, and hides another account’s bow (404)', async () => {
    const { agent } = await signedInAgent(app);
    const mine = await bowWithTwoBuilds(agent);
    const other = await bowWithTwoBuilds(agent);
    const mixed = await agent.get(`/api/bows/${mine.bowId}/compare?builds=${mine.heavy.id},${other.light.id}`);
    expect(mixed.status).toBe(400);
    expect(mixed.body.error.message).toBe(`Build ${other.light.id} is not one of this bow’s arrow builds.`);

    const { agent: stranger } = await signedInAgent(app);
    const res = await stranger.get(`/api/bows/${mine.bowId}/compare?builds=${mine.heavy.id},${mine.light.id}`);
    expect(res.status).toBe(404);
    expect(res.body.error.message).toBe('That bow was not found.');
    expect((await agent.get(`/api/bows/999999999/compare?builds=1,2`)).status).toBe(404);
    expect((await agent.post(`/api/bows/${mine.bowId}/compare`).set(CSRF)).status).toBe(404);
  });
});
