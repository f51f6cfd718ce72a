import { DOMParser } from '@xmldom/xmldom';
import { closeDb, signedInAgent, testApp } from '../helpers/api';
import { fieldCardResponseSchema } from '@/shared/field-card';
import { fittedReadings } from '@/server/services/fit-service';
import { bowWithSightIn, type Agent } from './bow-fixtures';

const app = testApp();
afterAll(closeDb);
// Sign-ups (bcrypt), fits and PDFs: slow when the API test files run in parallel on two cores.
jest.setTimeout(30_000);

/** Keep the body of an SVG/PDF response as bytes. */
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

/** 72 PostScript points per inch and 25.4 mm per inch (exact, international yard and pound, 1959). */
const POINTS_PER_MM = 72 / 25.4;

describe('GET /api/sight-ins/:id/field-card', () => {
  it('tabulates −40°…+40° by 20–60 yd for the sight-in air: level rows are the stored fit’s marks, aim-as-if the distance itself', async () => {
    const { agent } = await signedInAgent(app);
    const { sightIn } = await bowWithSightIn(agent);
    const res = await agent.get(`/api/sight-ins/${sightIn.id}/field-card`);
    expect(res.status).toBe(200);
    const { card, labels } = fieldCardResponseSchema.parse(res.body);
    expect(labels).toEqual({ bow: 'Test slider', build: 'Test heavy', date: '2026-11-02', place: 'Test range' });
    expect(card.anglesDeg).toEqual([-40, -30, -20, -10, 0, 10, 20, 30, 40]);
    expect(card.distances).toEqual([20, 30, 40, 50, 60]);
    expect(card.rows).toHaveLength(45);
    expect(card.sameAirAsSightIn).toBe(true);
    const fitted = fittedReadings(sightIn.fit, card.distances);
    for (const row of card.rows.filter((candidate) => candidate.angleDeg === 0)) {
      expect(row.markMm!).toBeCloseTo(fitted[card.distances.indexOf(row.distance)], 9);
      expect(row.aimAsIf!).toBeCloseTo(row.distance, 3);
    }
    for (const row of card.rows.filter((candidate) => candidate.angleDeg !== 0 && candidate.distance >= 30)) {
      // Up or down, a slope shot needs less than the level mark at its slant distance, and the rule's distance is S·cos θ.
      expect(row.markMm!).toBeLessThan(fitted[card.distances.indexOf(row.distance)]);
      expect(row.horizontal).toBeCloseTo(row.distance * Math.cos((row.angleDeg * Math.PI) / 180), 12);
      expect(row.aimAsIfMinusHorizontal!).toBeCloseTo(row.aimAsIf! - row.horizontal, 12);
    }
    card.shift.forEach((shift) => expect(shift.shiftMm).toBe(0));
    expect(card.cautions.join(' ')).toMatch(/estimates; confirm on real terrain/);
    expect(card.cautions.join(' ')).toMatch(/hunting rules/);
  });

  it('shifts the marks for altitude and temperature: up the scale in thin air, none in the sight-in’s own air', async () => {
    const { agent } = await signedInAgent(app);
    const { sightIn } = await bowWithSightIn(agent, [20, 40, 60], { altitudeM: 600, temperatureC: 12 });
    const high = fieldCardResponseSchema.parse(
      (await agent.get(`/api/sight-ins/${sightIn.id}/field-card?altitudeM=2700&temperatureC=5&angles=-30,0&distances=20,40,60`)).body,
    ).card;
    expect(high.sameAirAsSightIn).toBe(false);
    expect(high.air).toMatchObject({ altitudeM: 2700, temperatureC: 5 });
    expect(high.sightIn).toMatchObject({ altitudeM: 600, temperatureC: 12 });
    expect(high.air.airDensityKgM3).toBeLessThan(high.sightIn.airDensityKgM3);
    high.shift.forEach((row) => expect(row.shiftMm!).toBeLessThan(0));
    expect(high.shift[2].shiftMm!).toBeLessThan(high.shift[0].shiftMm!);
    // Level at 2700 m the 40 yd shot takes the mark of a shorter distance on the sight-in tape.
    const level40 = high.rows.find((row) => row.angleDeg === 0 && row.distance === 40)!;
    expect(level40.aimAsIf!).toBeLessThan(40);
    expect(level40.markMm!).toBeCloseTo(high.shift[1].markMm!, 9);

    const same = fieldCardResponseSchema.parse(
      (await agent.get(`/api/sight-ins/${sightIn.id}/field-card?altitudeM=600&temperatureC=12`)).body,
    ).card;
    same.shift.forEach((row) => expect(Math.abs(row.shiftMm!)).toBeLessThan(1e-9));
  });

  it('checks the query with field messages', async () => {
    const { agent } = await signedInAgent(app);
    const { sightIn } = await bowWithSightIn(agent);
    const cases: [string, Record<string, string>][] = [
      ['angles=70', { 'query.angles.0': 'Each angle must be at most 60°' }],
      ['angles=-10,-10', { 'query.angles.1': 'Angle -10 is listed twice' }],
      ['angles=1,2,3,4,5,6,7,8,9,10', { 'query.angles': 'Choose at most 9 angles for one card' }],
      ['distances=20,abc', { 'query.distances.1': 'Each distance must be a number' }],
      ['distances=2', { 'query.distances.0': 'Each distance must be at least 5' }],
      ['altitudeM=9000', { 'query.altitudeM': 'Altitude must be at most 5000 m' }],
      ['temperatureC=hot', { 'query.temperatureC': 'Temperature must be a number' }],
    ];
    for (const [query, fields] of cases) {
      const res = await agent.get(`/api/sight-ins/${sightIn.id}/field-card?${query}`);
      expect({ query, status: res.status, fields: res.body.error?.fields }).toEqual({ query, status: 400, fields });
    }
    expect((await agent.get('/api/sight-ins/abc/field-card')).status).toBe(400);
  });

  it('hides another account’s sight-in (404) on the JSON, the SVG and the PDF', async () => {
    const { agent } = await signedInAgent(app);
    const { sightIn } = await bowWithSightIn(agent);
    const { agent: stranger } = await signedInAgent(app);
    for (const suffix of ['field-card', 'field-card.svg', 'field-card.pdf']) {
      const res = await stranger.get(`/api/sight-ins/${sightIn.id}/${suffix}`);
      expect({ suffix, status: res.status, message: res.body.error?.message }).toEqual({
        suffix,
        status: 404,
        message: 'That sight-in was not found.',
      });
    }
  });
});

describe('the printed field card', () => {
  it('field-card.svg is 100 × 150 mm of outline glyphs (no <text>), its boxes the JSON’s figures', async () => {
    const { agent } = await signedInAgent(app);
    const { sightIn } = await bowWithSightIn(agent);
    const query = 'angles=-30,0,30&distances=20,40,60&altitudeM=2700';
    const res = await download(agent, `/api/sight-ins/${sightIn.id}/field-card.svg?${query}`);
    expect(res.status).toBe(200);
    expect(res.headers['content-type']).toMatch(/^image\/svg\+xml/);
    expect(res.headers['content-disposition']).toMatch(/^attachment; filename="?field-card-test-slider-2026-11-02\.svg"?$/);
    const text = res.body.toString('utf8');
    const errors: string[] = [];
    const doc = new DOMParser({
      onError: (level, message) => {
        if (level !== 'warning') errors.push(message);
      },
    }).parseFromString(text, 'image/svg+xml');
    expect(errors).toEqual([]);
    const svg = doc.documentElement!;
    expect(svg.getAttribute('width')).toBe('100mm');
    expect(svg.getAttribute('height')).toBe('150mm');
    expect(svg.getAttribute('viewBox')).toBe('0 0 100 150');
    expect(doc.getElementsByTagName('text').length).toBe(0);
    expect(text).not.toMatch(/<text[\s>]/);
    const json = fieldCardResponseSchema.parse((await agent.get(`/api/sight-ins/${sightIn.id}/field-card?${query}`)).body).card;
    const cells = Array.from(doc.getElementsByTagName('g') as unknown as ArrayLike<Element>).filter(
      (g) => g.getAttribute('class') === 'cell',
    );
    expect(cells).toHaveLength(9);
    for (const cell of cells) {
      const row = json.rows.find(
        (candidate) =>
          candidate.angleDeg === Number(cell.getAttribute('data-angle')) &&
          candidate.distance === Number(cell.getAttribute('data-distance')),
      )!;
      expect(Number(cell.getAttribute('data-mark-mm'))).toBeCloseTo(row.markMm!, 9);
    }
    const labels = Array.from(doc.getElementsByTagName('path') as unknown as ArrayLike<Element>).map((path) =>
      path.getAttribute('aria-label'),
    );
    expect(labels).toContain('Marks for 2700 m, standard temperature');
    expect(labels).toContain('Slope and altitude corrections are estimates; confirm on real terrain.');
    // The crosswind table: 5, 10, 15 mph at each distance, the JSON's holds, and the wind caution.
    expect(json.wind.rows.map((row) => row.speed)).toEqual([5, 10, 15]);
    const wind = Array.from(doc.getElementsByTagName('g') as unknown as ArrayLike<Element>).filter(
      (g) => (g.getAttribute('data-wind') ?? '') !== '',
    );
    expect(wind).toHaveLength(9);
    for (const box of wind) {
      const cell = json.wind.rows
        .find((row) => row.speed === Number(box.getAttribute('data-wind')))!
        .cells.find((c) => c.distance === Number(box.getAttribute('data-distance')))!;
      expect(Number(box.getAttribute('data-hold-mm'))).toBeCloseTo(cell.holdMm!, 9);
    }
    expect(labels.join(' ')).toMatch(/only practice in wind confirms them/);
    // Everything drawn stays on the card.
    expect(Number(svg.getAttribute('data-content-bottom-mm'))).toBeLessThan(146);
  });

  it('field-card.pdf is one page of exactly 100 × 150 mm', async () => {
    const { agent } = await signedInAgent(app);
    const { sightIn } = await bowWithSightIn(agent);
    const res = await download(agent, `/api/sight-ins/${sightIn.id}/field-card.pdf?altitudeM=2700&temperatureC=5`);
    expect(res.status).toBe(200);
    expect(res.headers['content-type']).toBe('application/pdf');
    expect(res.headers['content-disposition']).toMatch(/field-card-test-slider-2026-11-02\.pdf/);
    const pdf = res.body as Buffer;
    expect(pdf.subarray(0, 5).toString('latin1')).toBe('%PDF-');
    const boxes = [...pdf.toString('latin1').matchAll(/\/MediaBox\s*\[\s*([\d.\s-]+)\]/g)].map((match) =>
      match[1].trim().split(/\s+/).map(Number),
    );
    expect(boxes).toHaveLength(1);
    const [x0, y0, x1, y1] = boxes[0];
    expect(Math.abs(x1 - x0 - 100 * POINTS_PER_MM)).toBeLessThan(0.01);
    expect(Math.abs(y1 - y0 - 150 * POINTS_PER_MM)).toBeLessThan(0.01);
  });
});
