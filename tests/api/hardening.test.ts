/**
 * Bad requests a careless client or an attacker sends get a 4xx with the
 * error shape {"error":{"code","message"}}, never a 500: bodies the JSON parser
 * cannot read (charsets other than UTF-8, unknown or broken Content-Encoding),
 * paging past any real list, broken percent-encoding in a path, malformed
 * multipart uploads (RFC 7578) and a truncated image.
 */
import http from 'node:http';
import type { AddressInfo } from 'node:net';
import zlib from 'node:zlib';
import request from 'supertest';
import { CSRF, closeDb, signedInAgent, testApp } from '@/tests/helpers/api';
import { bowBody } from './bow-fixtures';

const app = testApp();
type Agent = Awaited<ReturnType<typeof signedInAgent>>['agent'];

let agent: Agent;
let bowId: number;
let checkId: number;

beforeAll(async () => {
  ({ agent } = await signedInAgent(app));
  bowId = (await agent.post('/api/bows').set(CSRF).send(bowBody())).body.bow.id;
  checkId = (await agent.post(`/api/bows/${bowId}/checks`).set(CSRF).send({ place: 'bench' })).body.check.id;
});

afterAll(closeDb);

function expectShape(res: request.Response, status: number) {
  expect(res.status).toBe(status);
  expect(Object.keys(res.body)).toEqual(['error']);
  expect(res.body.error).toMatchObject({ code: expect.any(String), message: expect.any(String) });
  expect(Object.keys(res.body.error).every((key) => ['code', 'message', 'fields'].includes(key))).toBe(true);
  expect(res.body.error.message.length).toBeGreaterThan(10);
}

describe('bodies the JSON parser cannot read', () => {
  it.each(['latin1', 'koi8-r', 'x-nonsense'])('refuses charset=%s with 415, signed out or in', async (charset) => {
    for (const client of [request(app), agent]) {
      const res = await client
        .post('/api/auth/sign-in')
        .set(CSRF)
        .set('Content-Type', `application/json; charset=${charset}`)
        .send(Buffer.from('{"email":"a@b.test","password":"x"}'));
      expectShape(res, 415);
      expect(res.body.error.code).toBe('unsupported_charset');
    }
  });

  it('refuses Content-Encoding: compress with 415 on any /api path', async () => {
    for (const path of ['/api/auth/sign-up', '/api/bows', `/api/bows/${bowId}/shares`, '/api/no/such/path']) {
      const res = await agent
        .post(path)
        .set(CSRF)
        .set('Content-Type', 'application/json')
        .set('Content-Encoding', 'compress')
        .send(Buffer.from('{}'));
      expectShape(res, 415);
      expect(res.body.error.code).toBe('unsupported_encoding');
    }
  });

  it('refuses a "gzip" body that is not gzip with 400, and reads a real gzip body', async () => {
    const res = await request(app)
      .post('/api/auth/sign-in')
      .set(CSRF)
      .set('Content-Type', 'application/json')
      .set('Content-Encoding', 'gzip')
      .send(Buffer.from('{"email":"x"}'));
    expectShape(res, 400);
    // supertest re-encodes a Buffer sent with Content-Encoding, so the real gzip body goes over plain http.
    const body = zlib.gzipSync(Buffer.from(JSON.stringify({ email: 'nobody@example.test', password: 'a password here' })));
    const server = app.listen(0, '127.0.0.1');
    await new Promise((resolve) => server.once('listening', resolve));
    const real = await new Promise<{ status: number }>((resolve, reject) => {
      const req = http.request(
        {
          host: '127.0.0.1',
          port: (server.address() as AddressInfo).port,
          method: 'POST',
          path: '/api/auth/sign-in',
          headers: { ...CSRF, 'Content-Type': 'application/json', 'Content-Encoding': 'gzip', 'Content-Length': body.length },
        },
        (res) => {
          res.resume();
          res.on('end', () => resolve({ status: res.statusCode ?? 0 }));
        },
      );
      req.on('error', reject);
      req.end(body);
    });
    await new Promise((resolve) => server.close(resolve));
    expect(real.status).toBe(401); // read and checked: wrong e-mail or password
  });

  it('still refuses a body over 1 MB with 413 and broken JSON with 400', async () => {
    expectShape(
      await request(app)
        .post('/api/auth/sign-in')
        .set(CSRF)
        .set('Content-Type', 'application/json')
        .send(`{"x":"${'a'.repeat(1_100_000)}"}`),
      413,
    );
    expectShape(await request(app).post('/api/auth/sign-in').set(CSRF).set('Content-Type', 'application/json').send('{"x":'), 400);
  });
});

describe('numbers in the address', () => {
  it('bounds page on the bow audit log and the admin lists', async () => {
    for (const page of ['4e17', '1e21', '100001', '-1', '0', '1.5', 'abc']) {
      const res = await agent.get(`/api/bows/${bowId}/audit`).query({ page });
      expectShape(res, 400);
      expect(res.body.error.fields?.['query.page'] ?? Object.values(res.body.error.fields ?? {})[0]).toBeTruthy();
    }
    const fine = await agent.get(`/api/bows/${bowId}/audit`).query({ page: '2' });
    expect(fine.status).toBe(200);
  });

  it('refuses ids beyond the database column with 400, and a missing one with 404', async () => {
    expectShape(await agent.get('/api/bows/99999999999999999999'), 400);
    expectShape(await agent.get('/api/bows/2147483648'), 400);
    expectShape(await agent.get('/api/bows/2147483647'), 404);
  });

  it('refuses broken percent-encoding in a path parameter with 400, signed out or in', async () => {
    for (const client of [request(app), agent]) {
      for (const path of ['/api/bows/%E0%A4%A', '/api/sight-ins/%ZZ', '/api/dev/mail/%', '/api/invites/%C0%AF%']) {
        const res = await client.get(path);
        expect([400, 401]).toContain(res.status);
        expect(res.body.error).toEqual({ code: expect.any(String), message: expect.any(String) });
      }
    }
    const res = await request(app).get('/api/bows/%E0%A4%A');
    expectShape(res, 400);
    expect(res.body.error.code).toBe('bad_url');
  });
});

describe('malformed photo uploads', () => {
  const url = () => `/api/checks/${checkId}/steps/setup/photo`;
  const multipart = (boundary: string | null, body: string | Buffer) =>
    agent
      .post(url())
      .set(CSRF)
      .set('Content-Type', boundary === null ? 'multipart/form-data' : `multipart/form-data; boundary=${boundary}`)
      .send(Buffer.isBuffer(body) ? body : Buffer.from(body, 'binary'));

  it('refuses multipart without a boundary', async () => {
    expectShape(await multipart(null, '--x\r\n\r\n'), 400);
  });

  it('refuses a truncated part', async () => {
    const res = await multipart(
      'XyZ',
      '--XyZ\r\nContent-Disposition: form-data; name="photo"; filename="a.png"\r\nContent-Type: image/png\r\n\r\n\x89PNG\r\n',
    );
    expectShape(res, 400);
  });

  it('refuses a part header without a colon', async () => {
    const res = await multipart('XyZ', '--XyZ\r\nContent-Disposition form-data name photo\r\n\r\nabc\r\n--XyZ--\r\n');
    expect([400]).toContain(res.status);
    expectShape(res, 400);
  });

  it('answers a NUL in the file name with a 4xx, never a 500', async () => {
    const res = await multipart(
      'XyZ',
      '--XyZ\r\nContent-Disposition: form-data; name="photo"; filename="a\u0000b.png"\r\nContent-Type: image/png\r\n\r\n\x89PNG\r\n\x1a\n\r\n--XyZ--\r\n',
    );
    expect(res.status).toBeGreaterThanOrEqual(400);
    expect(res.status).toBeLessThan(500);
    expect(res.body.error).toMatchObject({ code: expect.any(String), message: expect.any(String) });
  });

  it('refuses the 8-byte PNG signature alone with a plain 415', async () => {
    const res = await agent
      .post(url())
      .set(CSRF)
      .attach('photo', Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]), { filename: 'cut.png', contentType: 'image/png' });
    expectShape(res, 415);
    expect(res.body.error.message).toMatch(/JPEG, PNG or WebP/);
  });
});
