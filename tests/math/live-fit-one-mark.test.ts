import { liveFit, type LiveFitText } from '@/components/sight-ins/live-fit';
import type { Build } from '@/shared/build';
import { TRUE_MODEL, marksOf } from './helpers';

// The sight-in screen's live fit (pure TypeScript, no React): one mark fits when the build has a chronographed speed.
const bow = { sightRadiusMm: 820, peepHeightMm: 110, scaleDirection: 'down' as const };
const buildWith = (speedFps: number | null) =>
  ({ id: 7, diameterMm: 6.5, dragCoefficient: 2, speedFps, derived: { totalGr: 420 } }) as unknown as Build;
const [mark20] = marksOf(TRUE_MODEL, [20]);
const text = (rows: { distance: number; markMm: number }[]): LiveFitText => ({
  buildId: '7',
  altitudeM: '',
  temperatureC: '',
  unit: 'yd',
  marks: rows.map((row) => ({ distance: String(row.distance), scaleMm: row.markMm.toFixed(2), arrowsShot: '', note: '' })),
});

describe('live fit with one mark', () => {
  it('fits one mark as an estimate when the build has a chronographed speed', () => {
    const result = liveFit(text([mark20]), bow, [buildWith(285)]);
    expect(result.state).toBe('fit');
    if (result.state !== 'fit') return;
    expect(result.fit.method).toBe('one-mark');
    expect(result.fit.warnings[0].code).toBe('one-mark');
    expect(result.fit.nextDistance).not.toBeNull();
  });

  it('waits for a second mark, saying how one mark could fit, when the build has no speed', () => {
    const result = liveFit(text([mark20]), bow, [buildWith(null)]);
    expect(result).toEqual(expect.objectContaining({ state: 'waiting', message: expect.stringContaining('chronographed speed') }));
    expect(liveFit(text([]), bow, [buildWith(285)]).state).toBe('waiting');
  });
});
