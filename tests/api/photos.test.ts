/**
 * Step photos are decoded, turned upright and stored without any metadata: a
 * phone photo's GPS position (EXIF GPS IFD), its camera details, XMP and JPEG
 * comments never reach the upload folder. Files that only look like images
 * (a JPEG header followed by HTML, the PNG signature alone) are refused.
 * EXIF tags are written with sharp's withExif (IFD3 is the GPS IFD, as sharp
 * documents it) and read back with exifreader.
 */
import fs from 'node:fs';
import path from 'node:path';
import { load as readExif } from 'exifreader';
import sharp from 'sharp';
import { config } from '@/server/config';
import { Photo } from '@/server/models';
import { CSRF, closeDb, signedInAgent, testApp } from '../helpers/api';
import { bowBody } from './bow-fixtures';

const app = testApp();
jest.setTimeout(30_000);
afterAll(closeDb);

type Agent = Awaited<ReturnType<typeof signedInAgent>>['agent'];
let agent: Agent;
let checkId: number;

beforeAll(async () => {
  ({ agent } = await signedInAgent(app));
  const bowId = (await agent.post('/api/bows').set(CSRF).send(bowBody())).body.bow.id;
  checkId = (await agent.post(`/api/bows/${bowId}/checks`).set(CSRF).send({ place: 'bench' })).body.check.id;
});

/** A JPEG comment segment (marker FF FE, ITU-T T.81 B.2.4.5) put right after the start-of-image marker. */
function withJpegComment(jpeg: Buffer, comment: string): Buffer {
  const text = Buffer.from(comment, 'latin1');
  const length = Buffer.alloc(2);
  length.writeUInt16BE(text.length + 2);
  return Buffer.concat([jpeg.subarray(0, 2), Buffer.from([0xff, 0xfe]), length, text, jpeg.subarray(2)]);
}

/** A 40 × 20 phone-style JPEG: orientation 6 (shown turned 90° clockwise), camera and GPS tags, XMP and a comment. */
async function phonePhoto(): Promise<Buffer> {
  const jpeg = await sharp({ create: { width: 40, height: 20, channels: 3, background: { r: 200, g: 90, b: 30 } } })
    .jpeg()
    .withMetadata({ orientation: 6 }) // sharp writes the orientation tag itself; withExif's own is overridden
    .withExifMerge({
      IFD0: { Make: 'Invented Phone Co', Model: 'Model Nine' },
      IFD3: { GPSLatitudeRef: 'N', GPSLatitude: '46/1 52/1 3230/100', GPSLongitudeRef: 'W', GPSLongitude: '113/1 59/1 4366/100' },
    })
    .withXmp(
      '<x:xmpmeta xmlns:x="adobe:ns:meta/"><rdf:RDF xmlns:rdf="http://www.w3.org/1999/02/22-rdf-syntax-ns#"><rdf:Description xmlns:dc="http://purl.org/dc/elements/1.1/" dc:title="Elk camp, north ridge"/></rdf:RDF></x:xmpmeta>',
    )
    .toBuffer();
  return withJpegComment(jpeg, 'Shot at the north ridge camp');
}

const upload = (bytes: Buffer, filename: string, contentType: string) =>
  agent.post(`/api/checks/${checkId}/steps/setup/photo`).set(CSRF).attach('photo', bytes, { filename, contentType });

it('the test photo really carries GPS, camera, XMP and a comment (so the next test can fail)', async () => {
  const tags = readExif(await phonePhoto(), { expanded: true });
  expect(tags.gps?.Latitude).toBeCloseTo(46.876, 2);
  expect(tags.exif?.Make?.description).toBe('Invented Phone Co');
  expect(tags.exif?.Orientation?.value).toBe(6);
  expect(tags.xmp).toBeDefined();
  expect((await phonePhoto()).includes(Buffer.from('north ridge camp'))).toBe(true);
});

it('stores a phone photo upright with none of its metadata', async () => {
  const res = await upload(await phonePhoto(), 'IMG_0042.jpg', 'image/jpeg');
  expect(res.status).toBe(201);
  expect(res.body.photo.mimeType).toBe('image/jpeg');
  const row = (await Photo.findByPk(res.body.photo.id))!;
  const stored = fs.readFileSync(path.join(config.uploadDir, row.storageKey));
  expect(stored.length).toBe(row.sizeBytes);

  const tags = readExif(stored, { expanded: true });
  expect(tags.gps).toBeUndefined();
  expect(tags.exif).toBeUndefined();
  expect(tags.xmp).toBeUndefined();
  expect(stored.includes(Buffer.from('north ridge'))).toBe(false);
  expect(stored.includes(Buffer.from('Invented Phone'))).toBe(false);
  expect(stored.includes(Buffer.from([0xff, 0xfe]))).toBe(false); // no comment segment
  // Turned as the orientation tag said: 40 × 20 shown as 20 × 40, and no orientation left to apply twice.
  const meta = await sharp(stored).metadata();
  expect(meta).toMatchObject({ format: 'jpeg', width: 20, height: 40 });
  expect(meta.orientation).toBeUndefined();
  expect(meta.exif).toBeUndefined();

  // What is served is what was stored.
  const served = await agent
    .get(`/api/photos/${row.id}`)
    .buffer(true)
    .parse((r, done) => {
      const parts: Buffer[] = [];
      r.on('data', (part: Buffer) => parts.push(part));
      r.on('end', () => done(null, Buffer.concat(parts)));
    });
  expect(Buffer.compare(served.body as Buffer, stored)).toBe(0);
});

it('strips text chunks from a PNG too', async () => {
  const png = await sharp({ create: { width: 8, height: 8, channels: 4, background: '#3a7' } })
    .png()
    .withMetadata()
    .withExif({ IFD3: { GPSLatitudeRef: 'S', GPSLatitude: '33/1 51/1 0/1' } })
    .toBuffer();
  expect(readExif(png, { expanded: true }).gps).toBeDefined();
  const res = await upload(png, 'bubble.png', 'image/png');
  expect(res.status).toBe(201);
  const row = (await Photo.findByPk(res.body.photo.id))!;
  const stored = fs.readFileSync(path.join(config.uploadDir, row.storageKey));
  expect(readExif(stored, { expanded: true }).gps).toBeUndefined();
  expect(stored.includes(Buffer.from('eXIf'))).toBe(false);
  expect((await sharp(stored).metadata()).format).toBe('png');
});

it('refuses a JPEG header followed by HTML with a plain 415, and stores nothing', async () => {
  const before = await Photo.count();
  const html = Buffer.concat([
    Buffer.from([0xff, 0xd8, 0xff, 0xe0, 0x00, 0x10, 0x4a, 0x46, 0x49, 0x46, 0x00, 0x01, 0x01, 0x00, 0x00, 0x01, 0x00, 0x01, 0x00, 0x00]),
    Buffer.from('<html><body><script>alert(document.cookie)</script></body></html>'),
  ]);
  const res = await upload(html, 'sight.jpg', 'image/jpeg');
  expect(res.status).toBe(415);
  expect(res.body.error).toEqual({
    code: 'unsupported_type',
    message: 'The photo must be a JPEG, PNG or WebP image; this file is not one (or is damaged), whatever its name says.',
  });
  expect(await Photo.count()).toBe(before);
});

it('refuses the PNG signature alone and a JPEG cut in half', async () => {
  const signature = Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]);
  expect((await upload(signature, 'cut.png', 'image/png')).status).toBe(415);
  const whole = await sharp({ create: { width: 64, height: 64, channels: 3, background: '#888' } })
    .jpeg()
    .toBuffer();
  const half = whole.subarray(0, Math.floor(whole.length / 2));
  const res = await upload(half, 'half.jpg', 'image/jpeg');
  expect(res.status).toBe(415);
  expect(res.body.error.code).toBe('unsupported_type');
});

it('refuses a GIF (decodes, but is not one of the three kinds)', async () => {
  const gif = await sharp({ create: { width: 4, height: 4, channels: 3, background: '#000' } })
    .gif()
    .toBuffer();
  expect((await upload(gif, 'a.gif', 'image/gif')).status).toBe(415);
});
