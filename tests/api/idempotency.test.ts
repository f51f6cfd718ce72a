/**
 * The Idempotency-Key middleware (server/middleware/idempotency.ts): a write
 * replayed with the same key by the same account is answered from the first
 * and writes nothing twice; another account's same key is its own; a refusal
 * is replayed as a refusal; the key is never shared between requests.
 */
import { CSRF, closeDb, signedInAgent, testApp } from '../helpers/api';
import { IdempotencyKey, SightIn } from '@/server/models';
import { bowWithBuild, knownMarks } from './bow-fixtures';

const app = testApp();
afterAll(closeDb);
jest.setTimeout(30_000);

/** The stored answer is written when the response finishes: wait for it before a replay. */
async function settled(userId: number, key: string) {
  for (let tries = 0; tries < 50; tries += 1) {
    const row = await IdempotencyKey.findOne({ where: { userId, idemKey: key } });
    if (row && row.statusCode !== null) return row;
    await new Promise((resolve) => setTimeout(resolve, 20));
  }
  throw new Error(`key ${key} never settled`);
}

describe('Idempotency-Key', () => {
  it('runs a new sight-in once: the replay gets the same answer and no second sight-in', async () => {
    const { agent, user } = await signedInAgent(app);
    const { bow, build } = await bowWithBuild(agent);
    const body = { buildId: build.id, date: '2026-11-30', marks: knownMarks([20, 40, 60]) };
    const key = 'outbox-0001-abcdef';
    const first = await agent.post(`/api/bows/${bow.id}/sight-ins`).set(CSRF).set('Idempotency-Key', key).send(body);
    expect(first.status).toBe(201);
    await settled(user.id, key);
    const again = await agent.post(`/api/bows/${bow.id}/sight-ins`).set(CSRF).set('Idempotency-Key', key).send(body);
    expect(again.status).toBe(201);
    expect(again.headers['idempotent-replayed']).toBe('true');
    expect(again.body.sightIn.id).toBe(first.body.sightIn.id);
    expect(await SightIn.count({ where: { bowId: bow.id } })).toBe(1);

    // A new key is a new write.
    const other = await agent
      .post(`/api/bows/${bow.id}/sight-ins`)
      .set(CSRF)
      .set('Idempotency-Key', 'outbox-0002-abcdef')
      .send({ ...body, date: '2026-12-01' });
    expect(other.status).toBe(201);
    expect(await SightIn.count({ where: { bowId: bow.id } })).toBe(2);
  });

  it('refuses the same key with another body, and a malformed key', async () => {
    const { agent, user } = await signedInAgent(app);
    const { bow, build } = await bowWithBuild(agent);
    const key = 'outbox-mismatch-1';
    const body = { buildId: build.id, date: '2026-11-30', marks: knownMarks([20, 60]) };
    await agent.post(`/api/bows/${bow.id}/sight-ins`).set(CSRF).set('Idempotency-Key', key).send(body);
    await settled(user.id, key);
    const changed = await agent
      .post(`/api/bows/${bow.id}/sight-ins`)
      .set(CSRF)
      .set('Idempotency-Key', key)
      .send({ ...body, date: '2026-11-29' });
    expect(changed.status).toBe(422);
    expect(changed.body.error.code).toBe('idempotency_mismatch');
    const bad = await agent.post(`/api/bows/${bow.id}/sight-ins`).set(CSRF).set('Idempotency-Key', 'x y').send(body);
    expect(bad.status).toBe(400);
    expect(await SightIn.count({ where: { bowId: bow.id } })).toBe(1);
  });

  it('replays a refusal (the bow was deleted) and keeps accounts apart', async () => {
    const first = await signedInAgent(app);
    const second = await signedInAgent(app);
    const { bow, build } = await bowWithBuild(first.agent);
    const body = { buildId: build.id, date: '2026-11-30', marks: knownMarks([20, 60]) };
    expect((await first.agent.delete(`/api/bows/${bow.id}`).set(CSRF)).status).toBe(204);
    const key = 'shared-key-123456';
    const refused = await first.agent.post(`/api/bows/${bow.id}/sight-ins`).set(CSRF).set('Idempotency-Key', key).send(body);
    expect(refused.status).toBe(404);
    await settled(first.user.id, key);
    const replayed = await first.agent.post(`/api/bows/${bow.id}/sight-ins`).set(CSRF).set('Idempotency-Key', key).send(body);
    expect(replayed.status).toBe(404);
    expect(replayed.body).toEqual(refused.body);

    // The same key from another account is that account's own request (here: its own bow).
    const own = await bowWithBuild(second.agent);
    const theirs = await second.agent
      .post(`/api/bows/${own.bow.id}/sight-ins`)
      .set(CSRF)
      .set('Idempotency-Key', key)
      .send({ ...body, buildId: own.build.id });
    expect(theirs.status).toBe(201);
    expect(theirs.headers['idempotent-replayed']).toBeUndefined();
  });

  it('claims no key for a request refused before it runs (no CSRF header), so the retry runs', async () => {
    const { agent, user } = await signedInAgent(app);
    const { bow, build } = await bowWithBuild(agent);
    const key = 'retry-after-csrf-1';
    const body = { buildId: build.id, date: '2026-11-30', marks: knownMarks([20, 60]) };
    // Without the CSRF header the request is refused before any route: 403, nothing stored.
    const refused = await agent.post(`/api/bows/${bow.id}/sight-ins`).set('Idempotency-Key', key).send(body);
    expect(refused.status).toBe(403);
    expect(await IdempotencyKey.count({ where: { userId: user.id, idemKey: key } })).toBe(0);
    const sent = await agent.post(`/api/bows/${bow.id}/sight-ins`).set(CSRF).set('Idempotency-Key', key).send(body);
    expect(sent.status).toBe(201);
    expect(await SightIn.count({ where: { bowId: bow.id } })).toBe(1);
  });
});
