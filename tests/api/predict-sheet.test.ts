import { DOMParser } from '@xmldom/xmldom';
import { closeDb, signedInAgent, testApp } from '../helpers/api';
import type { Agent } from './bow-fixtures';
import { bowWithTwoBuilds } from './build-tools-fixtures';

const app = testApp();
afterAll(closeDb);
jest.setTimeout(30_000);

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
const query =
  'name=Elk%20brass&grainsPerInch=9.3&cutLengthMm=717.55&diameterMm=6.2&pointGr=150&insertGr=75&nockGr=9&vaneCount=3&vaneWeightGr=7&wrapGr=8';

describe('GET /api/bows/:bowId/predict/sheet.svg|pdf', () => {
  it('prints the predicted tape on a page headed PREDICTED — NOT SIGHTED, naming the sight-in it is carried on', async () => {
    const { agent } = await signedInAgent(app);
    const { bowId, lightSightIn } = await bowWithTwoBuilds(agent);
    const res = await download(
      agent,
      `/api/bows/${bowId}/predict/sheet.svg?${query}&sightInId=${lightSightIn.id}&from=20&to=60&paper=letter`,
    );
    expect(res.status).toBe(200);
    expect(res.headers['content-type']).toMatch(/^image\/svg\+xml/);
    expect(res.headers['content-disposition']).toMatch(/predicted-sheet-elk-brass\.svg/);
    const doc = new DOMParser().parseFromString(res.body.toString('utf8'), 'image/svg+xml');
    const svg = doc.documentElement!;
    // US Letter: 8.5 × 11 in = 215.9 × 279.4 mm (1 in = 25.4 mm exactly).
    expect(Number(svg.getAttribute('width')!.replace('mm', ''))).toBeCloseTo(215.9, 6);
    expect(svg.getAttribute('data-predicted')).toBe('true');
    const words = Array.from(doc.getElementsByTagName('path') as unknown as ArrayLike<Element>)
      .map((path) => path.getAttribute('aria-label') ?? '')
      .filter(Boolean);
    expect(words[0]).toBe('PREDICTED — NOT SIGHTED');
    expect(words).toContain('PREDICTED · NOT SIGHTED');
    expect(words.join(' ')).toMatch(/Carried on the sight of the sight-in of .*Test light/);
    expect(doc.getElementsByTagName('text').length).toBe(0);
  });

  it('sends the same sheet as a one-page PDF of the paper’s size', async () => {
    const { agent } = await signedInAgent(app);
    const { bowId, lightSightIn } = await bowWithTwoBuilds(agent);
    const res = await download(agent, `/api/bows/${bowId}/predict/sheet.pdf?${query}&sightInId=${lightSightIn.id}`);
    expect(res.status).toBe(200);
    expect(res.headers['content-type']).toBe('application/pdf');
    const pdf = res.body as Buffer;
    expect(pdf.subarray(0, 5).toString('latin1')).toBe('%PDF-');
    // A4 is 210 × 297 mm = 595.28 × 841.89 pt (ISO 216; 1 pt = 1/72 in).
    const box = /\/MediaBox \[0 0 ([\d.]+) ([\d.]+)\]/.exec(pdf.toString('latin1'));
    expect(Number(box![1])).toBeCloseTo(595.28, 1);
    expect(Number(box![2])).toBeCloseTo(841.89, 1);
  });

  it('refuses a paper it does not know, naming the field', async () => {
    const { agent } = await signedInAgent(app);
    const { bowId } = await bowWithTwoBuilds(agent);
    const res = await agent.get(`/api/bows/${bowId}/predict/sheet.svg?${query}&paper=a3`);
    expect(res.status).toBe(400);
    expect(Object.keys(res.body.error.fields)).toContain('query.paper');
  });
});
