import { DOMParser, type Element as XmlElement } from '@xmldom/xmldom';
import { CSRF, closeDb, signedInAgent, testApp } from '../helpers/api';
import { Tape } from '@/server/models';
import { tapeSchema } from '@/shared/tape';
import type { StoredFit } from '@/shared/sight-in';
import { fittedReadings } from '@/server/services/fit-service';
import { bowWithSightIn, type Agent } from './bow-fixtures';

const app = testApp();
afterAll(closeDb);
// Sign-ups (bcrypt), fits and PDFs: slow when the API test files run in parallel on two cores.
jest.setTimeout(30_000);

/** Keep the body of an SVG/PDF response as text or bytes. */
const asBuffer = (res: NodeJS.ReadableStream & { setEncoding?: unknown }, done: (err: Error | null, body: Buffer) => void) => {
  const chunks: Buffer[] = [];
  res.on('data', (chunk: Buffer) => chunks.push(chunk));
  res.on('end', () => done(null, Buffer.concat(chunks)));
};

async function download(agent: Agent, url: string) {
  return agent
    .get(url)
    .buffer(true)
    .parse(asBuffer as never);
}

function parseSvg(body: Buffer) {
  const doc = new DOMParser().parseFromString(body.toString('utf8'), 'image/svg+xml');
  return doc.documentElement!;
}

/** The tick lines of one tape group (or of the whole document): distance → offset from the tape's top edge, mm. */
function ticksOf(root: XmlElement): Map<number, number> {
  const ticks = new Map<number, number>();
  const lines = root.getElementsByTagName('line');
  for (let i = 0; i < lines.length; i++) {
    const line = lines[i];
    const distance = line.getAttribute('data-distance');
    if (distance === null) continue;
    // y1 is the drawn position; it must equal y2 (a horizontal tick).
    expect(line.getAttribute('y1')).toBe(line.getAttribute('y2'));
    ticks.set(Number(distance), Number(line.getAttribute('y1')));
  }
  return ticks;
}

/**
 * Every tick against the stored fit: the spacing between the ticks of D and of
 * the first distance equals the spacing of their fitted marks (× scale),
 * within 0.01 mm; reversed for an upward-numbered tape.
 */
function expectTicksMatchFit(ticks: Map<number, number>, fit: StoredFit, { scale = 1, orientation = 'down' } = {}) {
  const distances = [...ticks.keys()];
  const marks = fittedReadings(fit, distances);
  const sign = orientation === 'down' ? 1 : -1;
  for (let i = 1; i < distances.length; i++) {
    const drawn = ticks.get(distances[i])! - ticks.get(distances[0])!;
    expect(Math.abs(drawn - sign * scale * (marks[i] - marks[0]))).toBeLessThan(0.01);
  }
  // The sighted distances against the fitted marks stored with the sight-in itself.
  const sighted = fit.residuals.filter((residual) => ticks.has(residual.distance));
  expect(sighted.length).toBeGreaterThanOrEqual(2);
  for (const residual of sighted.slice(1)) {
    const drawn = ticks.get(residual.distance)! - ticks.get(sighted[0].distance)!;
    expect(Math.abs(drawn - sign * scale * (residual.fittedMm - sighted[0].fittedMm))).toBeLessThan(0.01);
  }
}

describe('saved tapes', () => {
  it('checks the layout with field messages and saves nothing bad', async () => {
    const { agent } = await signedInAgent(app);
    const { sightIn } = await bowWithSightIn(agent);
    const res = await agent
      .post(`/api/sight-ins/${sightIn.id}/tapes`)
      .set(CSRF)
      .send({ fromDistance: 20, toDistance: 60, step: 3, widthMm: 2, paper: 'a3' });
    expect(res.status).toBe(400);
    expect(res.body.error.fields).toEqual({
      step: 'Tick step must be 0.5, 1, 2.5 or 5',
      widthMm: 'Tape width must be at least 6 mm',
      paper: 'Choose A4 or Letter paper',
    });
    const backwards = await agent.post(`/api/sight-ins/${sightIn.id}/tapes`).set(CSRF).send({ fromDistance: 60, toDistance: 20 });
    expect(backwards.body.error.fields).toEqual({ toDistance: 'To distance must be beyond the from distance' });
    expect(await Tape.count({ where: { sightInId: sightIn.id } })).toBe(0);
  });

  it('creates, lists, reads, changes and deletes a tape', async () => {
    const { agent } = await signedInAgent(app);
    const { bow, sightIn } = await bowWithSightIn(agent);
    const made = await agent
      .post(`/api/sight-ins/${sightIn.id}/tapes`)
      .set(CSRF)
      .send({ fromDistance: 15, toDistance: 80, label: 'Hunt tape' });
    expect(made.status).toBe(201);
    const tape = tapeSchema.parse(made.body.tape);
    expect(tape).toMatchObject({
      sightInId: sightIn.id,
      bowId: bow.id,
      fromDistance: 15,
      toDistance: 80,
      step: 1,
      unit: 'yd',
      orientation: 'down',
      widthMm: 12,
      mirror: false,
      paper: 'letter',
      label: 'Hunt tape',
    });
    expect((await agent.get(`/api/sight-ins/${sightIn.id}/tapes`)).body.tapes.map((t: { id: number }) => t.id)).toEqual([tape.id]);
    expect((await agent.get(`/api/tapes/${tape.id}`)).body.tape.label).toBe('Hunt tape');
    const changed = await agent.patch(`/api/tapes/${tape.id}`).set(CSRF).send({ orientation: 'up', mirror: true });
    expect(changed.status).toBe(200);
    expect(changed.body.tape).toMatchObject({ orientation: 'up', mirror: true, fromDistance: 15 });
    const bad = await agent.patch(`/api/tapes/${tape.id}`).set(CSRF).send({ toDistance: 10 });
    expect(bad.body.error.fields).toEqual({ toDistance: 'To distance must be beyond the from distance' });
    expect((await agent.delete(`/api/tapes/${tape.id}`).set(CSRF)).status).toBe(204);
    expect(await Tape.count({ where: { id: tape.id } })).toBe(0);
  });
});

describe('GET /api/sight-ins/:id/tape.svg', () => {
  it('draws a true-scale tape whose ticks sit where the stored fit puts the marks (to 0.01 mm)', async () => {
    const { agent } = await signedInAgent(app);
    const { sightIn } = await bowWithSightIn(agent, [20, 40, 60]);
    const res = await download(agent, `/api/sight-ins/${sightIn.id}/tape.svg?from=20&to=80&width=14`);
    expect(res.status).toBe(200);
    expect(res.headers['content-type']).toMatch(/^image\/svg\+xml/);
    expect(res.headers['content-disposition']).toMatch(/^attachment; filename="?test-slider-2026-11-02-tape\.svg"?$/);
    const svg = parseSvg(res.body);
    expect(svg.getAttribute('width')).toBe('14mm');
    expect(svg.getAttribute('viewBox')).toMatch(/^0 0 14 /);
    expect(svg.getAttribute('height')).toBe(`${svg.getAttribute('viewBox')!.split(' ')[3]}mm`);
    const ticks = ticksOf(svg);
    expect([...ticks.keys()]).toEqual(Array.from({ length: 61 }, (_, i) => 20 + i));
    expectTicksMatchFit(ticks, sightIn.fit);
  });

  it('draws a saved tape’s layout with ?tape=, numbers running up', async () => {
    const { agent } = await signedInAgent(app);
    const { sightIn } = await bowWithSightIn(agent, [20, 40, 60]);
    const made = await agent
      .post(`/api/sight-ins/${sightIn.id}/tapes`)
      .set(CSRF)
      .send({ fromDistance: 20, toDistance: 60, step: 5, orientation: 'up', widthMm: 10 });
    const res = await download(agent, `/api/sight-ins/${sightIn.id}/tape.svg?tape=${made.body.tape.id}`);
    expect(res.status).toBe(200);
    const svg = parseSvg(res.body);
    expect(svg.getAttribute('width')).toBe('10mm');
    const ticks = ticksOf(svg);
    expect([...ticks.keys()]).toEqual([20, 25, 30, 35, 40, 45, 50, 55, 60]);
    expectTicksMatchFit(ticks, sightIn.fit, { orientation: 'up' });
  });

  it('answers bad options with field messages, and another sight-in’s tape with a 404', async () => {
    const { agent } = await signedInAgent(app);
    const first = await bowWithSightIn(agent);
    const second = await bowWithSightIn(agent);
    const bad = await agent.get(`/api/sight-ins/${first.sightIn.id}/tape.svg?from=abc&step=3`);
    expect(bad.status).toBe(400);
    expect(bad.body.error.fields).toEqual({
      'query.from': 'From distance must be a number',
      'query.step': 'Tick step must be 0.5, 1, 2.5 or 5',
    });
    const made = await agent.post(`/api/sight-ins/${second.sightIn.id}/tapes`).set(CSRF).send({ fromDistance: 20, toDistance: 60 });
    const wrong = await agent.get(`/api/sight-ins/${first.sightIn.id}/tape.svg?tape=${made.body.tape.id}`);
    expect(wrong.status).toBe(404);
  });
});

describe('the print sheet', () => {
  it('sheet.svg holds the 100 % tape and its scale variants, true to the stored fit', async () => {
    const { agent } = await signedInAgent(app);
    const { sightIn } = await bowWithSightIn(agent, [20, 40, 60]);
    const res = await download(agent, `/api/sight-ins/${sightIn.id}/sheet.svg?from=20&to=70&paper=a4`);
    expect(res.status).toBe(200);
    expect(res.headers['content-type']).toMatch(/^image\/svg\+xml/);
    expect(res.headers['content-disposition']).toMatch(/^attachment; filename="?test-slider-2026-11-02-sheet\.svg"?$/);
    const svg = parseSvg(res.body);
    // ISO 216 A4: 210 × 297 mm.
    expect(svg.getAttribute('width')).toBe('210mm');
    expect(svg.getAttribute('height')).toBe('297mm');
    const groups = svg.getElementsByTagName('g');
    const byPercent = new Map<number, XmlElement>();
    for (let i = 0; i < groups.length; i++) {
      const percent = groups[i].getAttribute('data-percent');
      if (groups[i].getAttribute('class') === 'tape' && percent !== null) byPercent.set(Number(percent), groups[i]);
    }
    expect([...byPercent.keys()].sort((a, b) => a - b)).toEqual([-2, -1, -0.5, 0, 0.5, 1, 2]);
    expectTicksMatchFit(ticksOf(byPercent.get(0)!), sightIn.fit);
    expectTicksMatchFit(ticksOf(byPercent.get(1)!), sightIn.fit, { scale: 1.01 });
    expectTicksMatchFit(ticksOf(byPercent.get(-2)!), sightIn.fit, { scale: 0.98 });
  });

  it('prints the archer’s own words safely: a nickname with markup stays text', async () => {
    const { agent } = await signedInAgent(app);
    const { sightIn } = await bowWithSightIn(agent, [20, 40, 60], {}, { nickname: 'Fox "&" <script>x</script>' });
    const res = await download(agent, `/api/sight-ins/${sightIn.id}/sheet.svg?from=20&to=60`);
    expect(res.status).toBe(200);
    expect(res.headers['content-disposition']).toMatch(/^attachment; filename="?fox-scriptxscript-2026-11-02-sheet\.svg"?$/);
    const svg = parseSvg(res.body);
    expect(svg.getElementsByTagName('script').length).toBe(0);
    expect(res.body.toString('utf8')).not.toContain('<script>');
  });

  it('sheet.pdf is a PDF of the paper’s size', async () => {
    const { agent } = await signedInAgent(app);
    const { sightIn } = await bowWithSightIn(agent, [20, 40, 60]);
    const letter = await download(agent, `/api/sight-ins/${sightIn.id}/sheet.pdf?from=20&to=70`);
    expect(letter.status).toBe(200);
    expect(letter.headers['content-type']).toBe('application/pdf');
    expect(letter.headers['content-disposition']).toMatch(/^attachment; filename="?test-slider-2026-11-02-sheet\.pdf"?$/);
    expect(letter.body.subarray(0, 5).toString('latin1')).toBe('%PDF-');
    // US Letter is 8.5 × 11 in = 612 × 792 pt (PDF user space: 1/72 in per unit, ISO 32000-1 §8.3.2.3, section number from memory).
    expect(mediaBox(letter.body)).toEqual([0, 0, 612, 792].map((value) => expect.closeTo(value, 2)));

    const a4 = await download(agent, `/api/sight-ins/${sightIn.id}/sheet.pdf?from=20&to=70&paper=a4`);
    // A4 is 210 × 297 mm (ISO 216) = 595.28 × 841.89 pt.
    expect(mediaBox(a4.body)).toEqual([0, 0, (210 / 25.4) * 72, (297 / 25.4) * 72].map((value) => expect.closeTo(value, 2)));
  });
});

/** The first page's /MediaBox [x0 y0 x1 y1], pt. */
function mediaBox(pdf: Buffer): number[] {
  const match = /\/MediaBox\s*\[\s*([\d.\s-]+)\]/.exec(pdf.toString('latin1'));
  if (!match) throw new Error('no /MediaBox in the PDF');
  return match[1].trim().split(/\s+/).map(Number);
}

describe('ownership', () => {
  it('gives another account a 404 on every tape route and download, and changes nothing', async () => {
    const owner = await signedInAgent(app);
    const { sightIn } = await bowWithSightIn(owner.agent);
    const made = await owner.agent
      .post(`/api/sight-ins/${sightIn.id}/tapes`)
      .set(CSRF)
      .send({ fromDistance: 20, toDistance: 60, label: 'Owner tape' });
    const tapeId = made.body.tape.id;
    const stranger = (await signedInAgent(app)).agent;
    const responses = [
      [await stranger.get(`/api/sight-ins/${sightIn.id}/tapes`), 'That sight-in was not found.'],
      [
        await stranger.post(`/api/sight-ins/${sightIn.id}/tapes`).set(CSRF).send({ fromDistance: 20, toDistance: 60 }),
        'That sight-in was not found.',
      ],
      [await stranger.get(`/api/tapes/${tapeId}`), 'That tape was not found.'],
      [await stranger.patch(`/api/tapes/${tapeId}`).set(CSRF).send({ label: 'Taken' }), 'That tape was not found.'],
      [await stranger.delete(`/api/tapes/${tapeId}`).set(CSRF), 'That tape was not found.'],
      [await stranger.get(`/api/sight-ins/${sightIn.id}/tape.svg`), 'That sight-in was not found.'],
      [await stranger.get(`/api/sight-ins/${sightIn.id}/tape.svg?tape=${tapeId}`), 'That sight-in was not found.'],
      [await stranger.get(`/api/sight-ins/${sightIn.id}/sheet.svg`), 'That sight-in was not found.'],
      [await stranger.get(`/api/sight-ins/${sightIn.id}/sheet.pdf`), 'That sight-in was not found.'],
    ] as const;
    for (const [res, message] of responses) {
      expect(res.status).toBe(404);
      expect(res.headers['content-type']).toMatch(/^application\/json/);
      expect(res.body.error).toEqual({ code: 'not_found', message });
    }
    expect(await Tape.count({ where: { sightInId: sightIn.id } })).toBe(1);
    expect((await Tape.findByPk(tapeId))!.label).toBe('Owner tape');
  });
});
