/**
 * The bow read's cache (server/services/bow-read.ts, migration 0090): a read
 * answered from the cache is the read the database gives, whatever wrote in
 * between, and who may read is never cached.
 */
import { QueryTypes } from 'sequelize';
import { closeDb, signedInAgent, testApp } from '../helpers/api';
import { sequelize } from '@/server/db';
import * as revisions from '@/server/migrations/0090-bow-read-revisions';
import { bowWithSightIn } from './bow-fixtures';

const app = testApp();
afterAll(closeDb);
jest.setTimeout(30_000);

const revisionOf = async (bowId: number) =>
  Number(
    (
      await sequelize.query<{ revision: number }>('SELECT revision FROM bows WHERE id = ?', {
        replacements: [bowId],
        type: QueryTypes.SELECT,
      })
    )[0].revision,
  );

describe('the revisions the cache is keyed on', () => {
  it('has a trigger for every insert, update and delete of every table the bow read shows', async () => {
    const rows = await sequelize.query<{ table: string; event: string }>(
      `SELECT EVENT_OBJECT_TABLE AS \`table\`, EVENT_MANIPULATION AS event FROM information_schema.TRIGGERS
       WHERE TRIGGER_SCHEMA = DATABASE() AND ACTION_STATEMENT LIKE '%revision%'`,
      { type: QueryTypes.SELECT },
    );
    const have = new Set(rows.map((row) => `${row.table} ${row.event}`));
    // The tables of bow-read.ts's statements that hang off a bow.
    for (const table of [
      'arrow_builds',
      'sight_ins',
      'sight_in_marks',
      'tapes',
      'range_confirmations',
      'bow_changes',
      'level_checks',
      'level_steps',
    ])
      for (const event of ['INSERT', 'UPDATE', 'DELETE']) expect(have).toContain(`${table} ${event}`);
    expect(have).toContain('bows UPDATE');
    expect(have).toContain('users UPDATE');
    expect(have).toContain('users DELETE');
  });

  it('goes up when a mark is changed by plain SQL, not only through the app', async () => {
    const { agent } = await signedInAgent(app);
    const { bow, sightIn } = await bowWithSightIn(agent);
    const before = await revisionOf(bow.id);
    await sequelize.query('UPDATE sight_in_marks SET note = ? WHERE sight_in_id = ?', { replacements: ['windy', sightIn.id] });
    expect(await revisionOf(bow.id)).toBeGreaterThan(before);
  });
});

describe('a cached bow read', () => {
  it('shows a mark changed behind the app’s back on the next read', async () => {
    const { agent } = await signedInAgent(app);
    const { bow, sightIn } = await bowWithSightIn(agent, [20, 40, 60]);
    const first = await agent.get(`/api/bows/${bow.id}`);
    expect(first.body.bow.sightIns[0].summary.longestDistance).toBe(60);
    expect((await agent.get(`/api/bows/${bow.id}`)).body).toEqual(first.body); // from the cache

    await sequelize.query('UPDATE sight_in_marks SET distance = 70 WHERE sight_in_id = ? AND distance = 60', {
      replacements: [sightIn.id],
    });
    const after = await agent.get(`/api/bows/${bow.id}`);
    expect(after.status).toBe(200);
    expect(after.body.bow.sightIns[0].summary.longestDistance).toBe(70);
    const list = await agent.get('/api/bows');
    expect(list.status).toBe(200);
  });

  it('follows a renamed or deleted account that added a build', async () => {
    const { agent } = await signedInAgent(app);
    const helper = await signedInAgent(app, { name: 'Orla Fenwick' });
    const { bow, build } = await bowWithSightIn(agent);
    await sequelize.query('UPDATE arrow_builds SET added_by_id = ? WHERE id = ?', { replacements: [helper.user.id, build.id] });
    const named = await agent.get(`/api/bows/${bow.id}`);
    expect(named.body.bow.builds[0].addedBy).toMatchObject({ name: 'Orla Fenwick' });

    await sequelize.query('UPDATE users SET name = ? WHERE id = ?', { replacements: ['Orla Fenwick-Tarn', helper.user.id] });
    expect((await agent.get(`/api/bows/${bow.id}`)).body.bow.builds[0].addedBy).toMatchObject({ name: 'Orla Fenwick-Tarn' });

    await sequelize.query('DELETE FROM users WHERE id = ?', { replacements: [helper.user.id] }); // added_by_id → NULL by cascade, no trigger
    const gone = await agent.get(`/api/bows/${bow.id}`);
    expect(gone.status).toBe(200);
    expect(JSON.stringify(gone.body)).not.toContain('Orla');
  });

  it('never answers an account that may no longer read the bow', async () => {
    const owner = await signedInAgent(app);
    const other = await signedInAgent(app);
    const { bow } = await bowWithSightIn(owner.agent);
    expect((await owner.agent.get(`/api/bows/${bow.id}`)).status).toBe(200); // cached now
    expect((await other.agent.get(`/api/bows/${bow.id}`)).status).toBe(404);
    await sequelize.query(
      "INSERT INTO shares (bow_id, archer_id, tech_id, invited_email, state, created_at, updated_at) VALUES (?, ?, ?, 'tech@example.test', 'active', NOW(3), NOW(3))",
      {
        replacements: [bow.id, owner.user.id, other.user.id],
      },
    );
    expect((await other.agent.get(`/api/bows/${bow.id}`)).status).toBe(200);
    await sequelize.query("UPDATE shares SET state = 'revoked' WHERE bow_id = ?", { replacements: [bow.id] });
    expect((await other.agent.get(`/api/bows/${bow.id}`)).status).toBe(404);
    expect((await owner.agent.get(`/api/bows/${bow.id}`)).status).toBe(200);
  });

  it('is caught by the test runs’ check when a write raises no revision', async () => {
    const saved = process.env.PINWRIGHT_CHECK_READ_CACHE;
    process.env.PINWRIGHT_CHECK_READ_CACHE = '1';
    const { agent } = await signedInAgent(app);
    const { bow, sightIn } = await bowWithSightIn(agent, [20, 40, 60]);
    try {
      expect((await agent.get(`/api/bows/${bow.id}`)).status).toBe(200); // cached
      await sequelize.query('DROP TRIGGER sight_in_marks_update_bow_revision');
      await sequelize.query('UPDATE sight_in_marks SET distance = 80 WHERE sight_in_id = ? AND distance = 60', {
        replacements: [sightIn.id],
      });
      const stale = await agent.get(`/api/bows/${bow.id}`);
      expect(stale.status).toBe(500);
    } finally {
      process.env.PINWRIGHT_CHECK_READ_CACHE = saved;
      await revisions.up({ context: sequelize.getQueryInterface() }); // puts the trigger back (idempotent)
    }
    await sequelize.query('UPDATE sight_in_marks SET distance = 85 WHERE sight_in_id = ? AND distance = 80', {
      replacements: [sightIn.id],
    });
    expect((await agent.get(`/api/bows/${bow.id}`)).body.bow.sightIns[0].summary.longestDistance).toBe(85);
  });
});
