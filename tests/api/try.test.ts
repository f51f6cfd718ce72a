import request from 'supertest';
import { DOMParser } from '@xmldom/xmldom';
import { CSRF, closeDb, testApp } from '../helpers/api';
import { TRY_LIMIT_PER_MINUTE } from '@/server/routes/try';
import { knownMarks, knownSight } from './bow-fixtures';

afterAll(closeDb);
// Sign-ups (bcrypt), fits and PDFs: slow when the API test files run in parallel on two cores.
jest.setTimeout(30_000);

const binary = (res: NodeJS.ReadableStream, done: (err: Error | null, body: Buffer) => void) => {
  const chunks: Buffer[] = [];
  res.on('data', (chunk: Buffer) => chunks.push(chunk));
  res.on('end', () => done(null, Buffer.concat(chunks)));
};

/** Math's fit input, as the try-it page sends it: marks from the known sight of the fixtures. */
function fitInput(distances = [20, 60]) {
  return {
    distanceUnit: 'yd',
    sight: { radiusMm: knownSight.sightRadiusMm, peepHeightMm: knownSight.peepHeightMm },
    arrow: { massGr: knownSight.arrowMassGr, diameterMm: knownSight.arrowDiameterMm, dragCoefficient: knownSight.dragCoefficient },
    marks: knownMarks(distances).map((mark) => ({ distance: mark.distance, markMm: mark.scaleMm })),
  };
}

describe('POST /api/try/fit (no account)', () => {
  const app = testApp();

  it('fits two marks for a visitor without an account', async () => {
    const res = await request(app).post('/api/try/fit').set(CSRF).send(fitInput());
    expect(res.status).toBe(200);
    expect(res.body.fit.method).toBe('two-mark');
    // Two marks, drag and peep as entered: the speed of the sight the marks came from, within the 0.1 mm reading.
    expect(Math.abs(res.body.fit.speedFps - knownSight.speedFps)).toBeLessThan(3);
    expect(res.body.fit.rmsMm).toBeLessThan(1e-6);
    expect(res.body.fit.marks.length).toBeGreaterThan(0);
    expect(res.headers['set-cookie']).toBeUndefined();
  });

  it('names a bad field in plain words', async () => {
    const res = await request(app)
      .post('/api/try/fit')
      .set(CSRF)
      .send({ ...fitInput(), marks: [{ distance: 20, markMm: 18 }] });
    expect(res.status).toBe(400);
    expect(res.body.error.fields).toEqual({ marks: 'Enter at least two marks, or one mark and the chronographed speed (arrow.speedFps)' });
    const gap = await request(app)
      .post('/api/try/fit')
      .set(CSRF)
      .send({
        ...fitInput(),
        marks: [
          { distance: 20, markMm: 18.5 },
          { distance: 60, markMm: 18.6 },
        ],
      });
    expect(gap.status).toBe(400);
    expect(Object.keys(gap.body.error.fields)).toEqual(['marks']);
  });

  it('still needs the app’s request header (CSRF defence)', async () => {
    const res = await request(app).post('/api/try/fit').send(fitInput());
    expect(res.status).toBe(403);
  });

  it('returns a tape SVG and a print sheet PDF', async () => {
    const tape = await request(app)
      .post('/api/try/tape.svg')
      .set(CSRF)
      .send({ ...fitInput(), tape: { from: 20, to: 60, widthMm: 12 } })
      .buffer(true)
      .parse(binary as never);
    expect(tape.status).toBe(200);
    expect(tape.headers['content-type']).toMatch(/^image\/svg\+xml/);
    expect(tape.headers['content-disposition']).toMatch(/^attachment; filename="?pinwright-tape\.svg"?$/);
    const svg = new DOMParser().parseFromString(tape.body.toString('utf8'), 'image/svg+xml').documentElement!;
    expect(svg.getAttribute('width')).toBe('12mm');
    expect(svg.getElementsByTagName('line').length).toBeGreaterThanOrEqual(41);

    const sheet = await request(app)
      .post('/api/try/sheet.pdf')
      .set(CSRF)
      .send({ ...fitInput(), tape: { from: 20, to: 60 }, paper: 'letter' })
      .buffer(true)
      .parse(binary as never);
    expect(sheet.status).toBe(200);
    expect(sheet.headers['content-type']).toBe('application/pdf');
    expect(sheet.body.subarray(0, 5).toString('latin1')).toBe('%PDF-');
    // US Letter: 8.5 × 11 in at 72 pt per inch = 612 × 792 pt (PDF user space unit, ISO 32000-1; from memory).
    expect(sheet.body.toString('latin1')).toMatch(/\/MediaBox \[0 0 612 792\]/);
  });
});

describe('rate limit on /api/try', () => {
  it(`allows ${TRY_LIMIT_PER_MINUTE} requests a minute per address, then answers 429`, async () => {
    // A fresh app: its own limiter, untouched by the other tests.
    const app = testApp();
    // Cheap requests (refused by validation) count like any other.
    for (let i = 0; i < TRY_LIMIT_PER_MINUTE; i++) {
      const res = await request(app).post('/api/try/fit').set(CSRF).send({});
      expect(res.status).toBe(400);
    }
    const over = await request(app).post('/api/try/fit').set(CSRF).send(fitInput());
    expect(over.status).toBe(429);
    expect(over.body.error).toEqual({ code: 'rate_limited', message: 'Too many tries from this address. Wait a minute and try again.' });
    // One limiter for all the try routes.
    expect((await request(app).post('/api/try/tape.svg').set(CSRF).send(fitInput())).status).toBe(429);
    // Signed-in routes are not affected.
    expect((await request(app).get('/api/bows')).status).toBe(401);
  }, 30000);
});
