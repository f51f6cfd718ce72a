import { fitSight, printSheetSvg, SHEET_VARIANT_PERCENTS, PAPER_SIZES_MM, PRINT_INSTRUCTION, TAPE_CAUTION, FitInputError } from '@/math';
import { sheetPdf, POINTS_PER_MM } from '@/server/print/sheet-pdf';
import { TRUE_MODEL, inputWith, marksOf } from './helpers';
import { elements, numberAttribute, parseSvg } from './svg-helpers';

const fit = fitSight(inputWith(marksOf(TRUE_MODEL, [20, 60])));
const labels = { bow: 'Grey Heron (invented)', build: 'Ash shafts 420 gr', date: '2026-12-01' };

describe('print sheet SVG', () => {
  const svg = printSheetSvg(fit, { paper: 'a4', labels });
  const root = parseSvg(svg).documentElement!;

  it.each([
    ['a4', '210mm', '297mm', '0 0 210 297'],
    ['letter', '215.9mm', '279.4mm', '0 0 215.9 279.4'],
  ] as const)('is exactly %s: %s × %s (ISO 216; 8.5 × 11 in)', (paper, width, height, viewBox) => {
    const page = parseSvg(printSheetSvg(fit, { paper })).documentElement!;
    expect(page.getAttribute('width')).toBe(width);
    expect(page.getAttribute('height')).toBe(height);
    expect(page.getAttribute('viewBox')).toBe(viewBox);
  });

  it('has a calibration bar exactly 50 mm and one exactly 2 in (50.8 mm) long', () => {
    const bars = elements(root, 'rect').filter((rect) => rect.hasAttribute('data-length-mm'));
    const bar = (name: string) => bars.find((rect) => rect.getAttribute('data-calibration') === name)!;
    expect(numberAttribute(bar('50 mm'), 'width')).toBeCloseTo(50, 10);
    expect(numberAttribute(bar('2 in'), 'width')).toBeCloseTo(2 * 25.4, 10);
    // Not scaled by any enclosing transform.
    for (const name of ['50 mm', '2 in'])
      expect((bar(name).parentNode as unknown as { getAttribute(name: string): string | null }).getAttribute('transform')).toBeNull();
  });

  it('prints the tape at 100 % and the ±0.5, ±1, ±2 % variants, each labelled, scaled exactly', () => {
    const tapes = elements(root, 'g').filter((group) => group.getAttribute('class') === 'tape');
    expect(tapes.map((group) => Number(group.getAttribute('data-percent')))).toEqual([0, ...SHEET_VARIANT_PERCENTS]);
    const span = (group: (typeof tapes)[number]) => {
      const offsets = elements(group, 'line')
        .filter((line) => line.hasAttribute('data-distance'))
        .map((line) => numberAttribute(line, 'data-offset-mm'));
      return offsets[offsets.length - 1] - offsets[0];
    };
    const trueSpan = span(tapes[0]);
    // Offsets are written to 0.1 µm, so the ratio holds to a few parts in a million.
    for (const group of tapes.slice(1)) expect(span(group) / trueSpan).toBeCloseTo(1 + Number(group.getAttribute('data-percent')) / 100, 5);
    const labelled = elements(root, 'path').filter((path) => path.getAttribute('class') === 'variant-label');
    expect(labelled.map((path) => path.getAttribute('aria-label'))).toEqual(['100 %', '−2 %', '−1 %', '−0.5 %', '+0.5 %', '+1 %', '+2 %']);
  });

  it('carries the instruction, the caution, the bow, build, date and marks in small type (as outlines)', () => {
    const texts = elements(root, 'path').map((path) => path.getAttribute('aria-label') ?? '');
    const all = texts.join(' ');
    expect(all.replace(/\s+/g, ' ')).toContain(PRINT_INSTRUCTION);
    expect(all.replace(/\s+/g, ' ')).toContain(TAPE_CAUTION);
    expect(all).toContain('Grey Heron (invented)');
    expect(all).toContain('Ash shafts 420 gr');
    expect(all).toContain('2026-12-01');
    expect(all).toMatch(/20 yd at \d+\.\d\d mm, 60 yd at \d+\.\d\d mm/);
    expect(elements(root, 'text')).toHaveLength(0);
    // Everything lies on the page.
    const page = PAPER_SIZES_MM.a4;
    for (const group of elements(root, 'g').filter((g) => g.getAttribute('class') === 'tape')) {
      const [x, y] = /translate\(([\d.]+) ([\d.]+)\)/.exec(group.getAttribute('transform')!)!.slice(1).map(Number);
      const outline = elements(group, 'rect')[0];
      expect(x + numberAttribute(outline, 'width')).toBeLessThan(page.widthMm - 10);
      expect(y + numberAttribute(outline, 'height')).toBeLessThan(page.heightMm - 10);
    }
  });

  it('leaves the variants out on request and refuses a tape too long for the page', () => {
    const single = parseSvg(printSheetSvg(fit, { variants: false })).documentElement!;
    expect(elements(single, 'g').filter((group) => group.getAttribute('class') === 'tape')).toHaveLength(1);
    expect(() => printSheetSvg({ ...fit, model: { ...fit.model, speedFps: 160 } }, { tape: { from: 20, to: 100, widthMm: 40 } })).toThrow(
      FitInputError,
    );
  });
});

describe('print sheet PDF', () => {
  it.each([
    ['a4', 210, 297],
    ['letter', 215.9, 279.4],
  ] as const)('%s: the page is exactly the paper and 1 mm of the SVG is 1 mm on the page', async (paper, widthMm, heightMm) => {
    const svg = printSheetSvg(fit, { paper, labels, variants: false });
    const pdf = (await sheetPdf(svg, paper, { compress: false })).toString('latin1');
    expect(pdf.startsWith('%PDF-')).toBe(true);
    const box = /\/MediaBox \[0 0 ([\d.]+) ([\d.]+)\]/.exec(pdf)!.slice(1).map(Number);
    // 72 points per inch, 25.4 mm per inch (PDF 1.7, ISO 32000-1 §8.3.2.3: default user space unit 1/72 in).
    expect(Math.abs(box[0] - widthMm * (72 / 25.4))).toBeLessThan(1e-3);
    expect(Math.abs(box[1] - heightMm * (72 / 25.4))).toBeLessThan(1e-3);
    // Multiply the page's cm operators before the first drawing: the scale must be 72/25.4 pt per mm.
    const before = pdf.slice(pdf.indexOf('stream'), pdf.indexOf('scn'));
    let scale = 1;
    for (const match of before.matchAll(/([-\d.]+) 0 0 ([-\d.]+) [-\d.]+ [-\d.]+ cm/g)) scale *= Math.abs(Number(match[1]));
    expect(scale).toBeCloseTo(POINTS_PER_MM, 5);
    // The 50 mm bar is drawn from x to x + 50 in those units.
    const bar = elements(parseSvg(svg), 'rect').find((rect) => rect.getAttribute('data-calibration') === '50 mm')!;
    const x = numberAttribute(bar, 'x');
    const y = numberAttribute(bar, 'y');
    const n = (value: number) => String(Math.round(value * 1e6) / 1e6);
    expect(pdf).toContain(`${n(x)} ${n(y)} m\n${n(x + 50)} ${n(y)} l`);
  });
});
