import { fitSight, predictedSheetSvg, tapeSvg, withArrow, PREDICTED_CAUTION, PRINT_INSTRUCTION } from '@/math';
import { INCH_MM } from '@/math/units/constants';
import { TRUE_MODEL, inputWith, marksOf } from './helpers';
import { elements, parseSvg } from './svg-helpers';

const fit = fitSight(inputWith(marksOf(TRUE_MODEL, [20, 40, 60])));
const model = withArrow(fit.model, { massGr: 520, diameterMm: 6.5, speedFps: 262 });
const labels = {
  bow: 'Ridgeback test bow',
  build: 'Elk brass, 520 gr',
  speed: '262 fps (predicted)',
  sightIn: '14 Nov 2026 · Invented meadow · Test heavy',
};

describe('predicted print sheet SVG', () => {
  const svg = predictedSheetSvg(model, { from: 20, to: 80 }, { paper: 'letter', labels });
  const doc = parseSvg(svg);
  const root = doc.documentElement!;
  const words = elements(doc, 'path')
    .map((path) => path.getAttribute('aria-label') ?? '')
    .filter(Boolean);

  it('is a whole page in mm (US Letter is 8.5 × 11 in, exactly 215.9 × 279.4 mm) marked predicted', () => {
    expect(Number(root.getAttribute('width')!.replace('mm', ''))).toBeCloseTo(8.5 * INCH_MM, 6);
    expect(Number(root.getAttribute('height')!.replace('mm', ''))).toBeCloseTo(11 * INCH_MM, 6);
    expect(root.getAttribute('data-predicted')).toBe('true');
    expect(elements(doc, 'text')).toHaveLength(0);
  });

  it('says PREDICTED — NOT SIGHTED at the head and along the tape, with the caution, the print instruction and what it is carried on', () => {
    expect(words[0]).toBe('PREDICTED — NOT SIGHTED');
    expect(words).toContain('PREDICTED · NOT SIGHTED');
    expect(words.join(' ')).toContain(PREDICTED_CAUTION.slice(0, 30));
    expect(words.join(' ')).toContain(PRINT_INSTRUCTION.slice(0, 30));
    expect(words.join(' ')).toContain('Invented meadow');
    expect(words.join(' ')).toContain('Elk brass, 520 gr');
  });

  it('carries calibration bars of 50 mm and 2 in (50.8 mm, the inch being 25.4 mm exactly)', () => {
    const bars = elements(doc, 'rect').filter((rect) => rect.getAttribute('data-calibration'));
    const lengths = Object.fromEntries(bars.map((bar) => [bar.getAttribute('data-calibration'), Number(bar.getAttribute('width'))]));
    expect(lengths['50 mm']).toBeCloseTo(50, 6);
    expect(lengths['2 in']).toBeCloseTo(50.8, 6);
  });

  it('places the tape at true size: the same tick offsets as the sighted drawing of that model', () => {
    const plain = parseSvg(tapeSvg({ model }, { from: 20, to: 80 }));
    const offsets = (d: ReturnType<typeof parseSvg>) =>
      elements(d, 'line')
        .filter((line) => line.getAttribute('data-distance') !== null)
        .map((line) => [line.getAttribute('data-distance'), line.getAttribute('data-offset-mm')]);
    expect(offsets(doc)).toEqual(offsets(plain));
    expect(offsets(doc).length).toBeGreaterThan(10);
  });
});
