/**
 * The administrator's audit log names the bow (with its archer) and the
 * accounts of each entry, and narrows to one bow, one account and one kind.
 */
import { User } from '@/server/models';
import { recordAudit } from '@/server/services/audit-service';
import { CSRF, closeDb, signedInAgent, testApp } from '../helpers/api';
import { bowWithBuild } from './bow-fixtures';

const app = testApp();
jest.setTimeout(60_000);
afterAll(closeDb);

type Entry = {
  id: number;
  action: string;
  recordType: string;
  summary: string;
  bowId: number | null;
  bow: { id: number; nickname: string; ownerName: string } | null;
  account: { id: number; name: string } | null;
  actor: { id: number; name: string } | null;
};

describe('the administrator’s audit log', () => {
  it('names bows and accounts, and filters by bow, account and kind', async () => {
    const admin = await signedInAgent(app, { name: 'Idony Admin' });
    await User.update({ role: 'admin' }, { where: { id: admin.user.id } });
    const archer = await signedInAgent(app, { name: 'Wenna Threlkeld' });
    const tech = await signedInAgent(app, { name: 'Osric Pell' });
    const fen = (await bowWithBuild(archer.agent, { nickname: 'Threlkeld fen' })).bow;
    const moor = (await bowWithBuild(archer.agent, { nickname: 'Threlkeld moor' })).bow;
    await recordAudit({
      actorId: archer.user.id,
      action: 'invited',
      bowId: fen.id,
      recordType: 'share',
      recordId: null,
      summary: 'Invited a technician to Threlkeld fen',
    });
    await recordAudit({
      actorId: tech.user.id,
      action: 'created',
      bowId: fen.id,
      recordType: 'sight-in-mark',
      recordId: null,
      summary: 'Added a mark: 40 yd at 22 mm',
    });
    await recordAudit({
      actorId: tech.user.id,
      action: 'created',
      bowId: moor.id,
      recordType: 'level-check',
      recordId: null,
      summary: 'Added a level check',
    });
    const role = await admin.agent.patch(`/api/admin/accounts/${tech.user.id}`).set(CSRF).send({ role: 'tech' });
    expect(role.status).toBe(200);

    const all = await admin.agent.get('/api/admin/audit');
    expect(all.status).toBe(200);
    expect(all.body.kinds).toEqual(expect.arrayContaining(['account', 'level-check', 'sight-in-mark', 'share']));
    const mark = (all.body.entries as Entry[]).find((entry) => entry.summary === 'Added a mark: 40 yd at 22 mm')!;
    expect(mark.bow).toEqual({ id: fen.id, nickname: 'Threlkeld fen', ownerId: archer.user.id, ownerName: 'Wenna Threlkeld' });
    expect(mark.actor).toMatchObject({ id: tech.user.id, name: 'Osric Pell' });
    const roleEntry = (all.body.entries as Entry[]).find((entry) => entry.action === 'role-changed' && entry.account?.id === tech.user.id)!;
    expect(roleEntry.account).toEqual({ id: tech.user.id, name: 'Osric Pell', email: tech.email });
    expect(roleEntry.bow).toBeNull();

    const byBow = await admin.agent.get(`/api/admin/audit?bowId=${fen.id}`);
    expect((byBow.body.entries as Entry[]).map((entry) => entry.summary).sort()).toEqual([
      'Added a mark: 40 yd at 22 mm',
      'Invited a technician to Threlkeld fen',
    ]);
    expect(byBow.body.filters).toEqual({ bow: { id: fen.id, nickname: 'Threlkeld fen' }, account: null });

    // An account: what it did and what was done to it.
    const byTech = await admin.agent.get(`/api/admin/audit?accountId=${tech.user.id}`);
    expect((byTech.body.entries as Entry[]).map((entry) => entry.summary).sort()).toEqual([
      'Added a level check',
      'Added a mark: 40 yd at 22 mm',
      `Changed the role of Osric Pell <${tech.email}> from archer to tech`,
    ]);
    expect(byTech.body.filters.account).toEqual({ id: tech.user.id, name: 'Osric Pell' });
    // An archer: everything about their bows too.
    const byArcher = await admin.agent.get(`/api/admin/audit?accountId=${archer.user.id}`);
    expect(byArcher.body.total).toBe(3);

    const kindAndAccount = await admin.agent.get(`/api/admin/audit?accountId=${tech.user.id}&kind=level-check`);
    expect((kindAndAccount.body.entries as Entry[]).map((entry) => entry.summary)).toEqual(['Added a level check']);
    const kindAndBow = await admin.agent.get(`/api/admin/audit?bowId=${moor.id}&kind=share`);
    expect(kindAndBow.body.total).toBe(0);
  });

  it('refuses a malformed filter, naming it', async () => {
    const admin = await signedInAgent(app);
    await User.update({ role: 'admin' }, { where: { id: admin.user.id } });
    const badKind = await admin.agent.get('/api/admin/audit?kind=DROP%20TABLE');
    expect(badKind.status).toBe(400);
    // validate() names query fields as query.<name>.
    expect(badKind.body.error.fields['query.kind']).toBe('The kind is a record kind such as "share" or "sight-in-mark"');
    const badBow = await admin.agent.get('/api/admin/audit?bowId=abc');
    expect(badBow.status).toBe(400);
    expect(badBow.body.error.fields['query.bowId']).toBe('The bow id must be a number');
  });

  it('shows the archer’s own bow log with the bow named too', async () => {
    const archer = await signedInAgent(app, { name: 'Peregrine Aske' });
    const bow = (await bowWithBuild(archer.agent, { nickname: 'Aske hollow' })).bow;
    await recordAudit({
      actorId: null,
      action: 'created',
      bowId: bow.id,
      recordType: 'sight-in-mark',
      recordId: null,
      summary: 'Added a mark',
    });
    const log = await archer.agent.get(`/api/bows/${bow.id}/audit`);
    expect(log.status).toBe(200);
    expect(log.body.entries[0]).toMatchObject({ actor: null, bow: { nickname: 'Aske hollow', ownerName: 'Peregrine Aske' } });
  });
});
