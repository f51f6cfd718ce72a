import { spawnSync } from 'node:child_process';
import { join } from 'node:path';
import { tmpdir } from 'node:os';

// The command line as users run it: node server/cli/pinwright.js <command>, from any directory.
const cli = join(__dirname, '..', '..', 'server', 'cli', 'pinwright.js');
const run = (args: string[], input: string) => spawnSync(process.execPath, [cli, ...args], { input, cwd: tmpdir(), timeout: 60000 });

const good = {
  distanceUnit: 'yd',
  sight: { radiusMm: 820, peepHeightMm: 110 },
  arrow: { massGr: 420, diameterMm: 6.5, dragCoefficient: 2.0, speedFps: 285 },
  air: { altitudeM: 0, temperatureC: 15 },
  marks: [
    { distance: 20, markMm: 14.9 },
    { distance: 60, markMm: 32.6 },
  ],
  predict: [10, 20, 30, 40, 50, 60, 70, 80, 90, 100],
  shots: [{ distance: 40, angleDeg: -30 }],
};

describe('pinwright command line', () => {
  jest.setTimeout(120000);

  it('fit: exit 0 and the documented JSON shape', () => {
    const result = run(['fit'], JSON.stringify(good));
    expect(result.stderr.toString()).toBe('');
    expect(result.status).toBe(0);
    const fit = JSON.parse(result.stdout.toString());
    for (const key of ['speedFps', 'dragCoefficient', 'peepHeightMm', 'sightRadiusMm', 'rmsMm']) expect(typeof fit[key]).toBe('number');
    expect(fit.marks).toHaveLength(10);
    for (const mark of fit.marks) expect(Object.keys(mark)).toEqual(expect.arrayContaining(['distance', 'markMm', 'sigmaMm']));
    expect(fit.residuals.map((residual: { distance: number }) => residual.distance)).toEqual([20, 60]);
    expect(typeof fit.residuals[0].residualMm).toBe('number');
    expect(typeof fit.nextDistance).toBe('number');
    expect(fit.shots[0]).toEqual(
      expect.objectContaining({
        distance: 40,
        angleDeg: -30,
        markMm: expect.any(Number),
        aimAsIf: expect.any(Number),
        horizontal: expect.any(Number),
      }),
    );
    expect(Math.abs(fit.speedFps - 285)).toBeLessThan(2);
  });

  it.each([
    [
      'one mark and no chronographed speed',
      { ...good, arrow: { massGr: 420, diameterMm: 6.5 }, marks: [good.marks[0]] },
      'marks: enter at least two marks, or one mark and the chronographed speed (arrow.speedFps)',
    ],
    [
      'a duplicate distance',
      { ...good, marks: [good.marks[0], { distance: 20, markMm: 15 }] },
      'marks[1].distance: each distance may appear only once',
    ],
    [
      'an impossible gap',
      { ...good, marks: [good.marks[0], { distance: 60, markMm: 15.3 }] },
      /^marks: the 60 yd mark is only 0\.4 mm below/,
    ],
    ['a negative mass', { ...good, arrow: { massGr: -3, diameterMm: 6.5 } }, /^arrow\.massGr: /],
  ])('fit with %s: exit 2 and one plain line on stderr naming the field', (_, input, message) => {
    const result = run(['fit'], JSON.stringify(input));
    expect(result.status).toBe(2);
    expect(result.stdout.toString()).toBe('');
    const stderr = result.stderr.toString();
    expect(stderr.endsWith('\n')).toBe(true);
    expect(stderr.trimEnd().split('\n')).toHaveLength(1);
    if (typeof message === 'string') expect(stderr.trimEnd()).toBe(message);
    else expect(stderr).toMatch(message);
  });

  it('fit, tape and sheet take one mark with a chronographed speed: an estimate, said so, with the distance to shoot next', () => {
    const oneMark = { ...good, marks: [good.marks[0]], shots: undefined };
    const result = run(['fit'], JSON.stringify(oneMark));
    expect(result.stderr.toString()).toBe('');
    expect(result.status).toBe(0);
    const fit = JSON.parse(result.stdout.toString());
    expect(fit.method).toBe('one-mark');
    expect(fit.model.oneMark).toEqual({ distance: 20, nextDistance: fit.nextDistance });
    expect(typeof fit.nextDistance).toBe('number');
    expect(fit.warnings[0]).toEqual(
      expect.objectContaining({ code: 'one-mark', message: expect.stringMatching(/^Estimate from one mark .* Shoot \d+ yd next$/) }),
    );
    // Every distance but the sighted one carries a band wider than the mark's own 0.2 mm beyond 40 yd.
    for (const mark of fit.marks.filter((m: { distance: number }) => m.distance >= 40)) expect(mark.sigmaMm).toBeGreaterThan(0.3);
    const tape = run(['tape'], JSON.stringify({ ...oneMark, tape: { from: 20, to: 80 } }));
    expect(tape.status).toBe(0);
    expect(tape.stdout.toString()).toMatch(/data-estimate="one-mark"/);
    expect(tape.stdout.toString()).toMatch(/aria-label="ESTIMATE FROM ONE MARK/);
    const sheet = run(['sheet'], JSON.stringify(oneMark));
    expect(sheet.status).toBe(0);
    expect(sheet.stdout.toString()).toMatch(/data-caution="one-mark"/);
  });

  it('refuses broken JSON and unknown commands with exit 2', () => {
    const broken = run(['fit'], '{"distanceUnit": ');
    expect(broken.status).toBe(2);
    expect(broken.stderr.toString()).toMatch(/^input: not valid JSON/);
    const unknown = run(['plot'], JSON.stringify(good));
    expect(unknown.status).toBe(2);
    expect(unknown.stderr.toString()).toMatch(/^command: "plot" is not a pinwright command/);
  });

  it('tape prints an SVG in mm; sheet prints the sheet SVG, and a PDF with --pdf', () => {
    const tape = run(['tape'], JSON.stringify({ ...good, tape: { from: 20, to: 100, step: 1, widthMm: 12, orientation: 'down' } }));
    expect(tape.status).toBe(0);
    expect(tape.stdout.toString()).toMatch(
      /^<svg xmlns="http:\/\/www\.w3\.org\/2000\/svg" width="12mm" height="[\d.]+mm" viewBox="0 0 12 /,
    );
    const sheet = run(['sheet'], JSON.stringify({ ...good, paper: 'letter', labels: { bow: 'Test bow' } }));
    expect(sheet.status).toBe(0);
    expect(sheet.stdout.toString()).toMatch(/width="215\.9mm" height="279\.4mm"/);
    const pdf = run(['sheet', '--pdf'], JSON.stringify({ ...good, paper: 'a4' }));
    expect(pdf.status).toBe(0);
    expect(pdf.stdout.subarray(0, 5).toString()).toBe('%PDF-');
    const badTape = run(['tape'], JSON.stringify({ ...good, tape: { step: 3 } }));
    expect(badTape.status).toBe(2);
    expect(badTape.stderr.toString()).toMatch(/^tape\.step: /);
  });
});
