import { fitSight, tapeSvg, tapeLayout, predictMarkMm, metresToYards, FitInputError, type FitResult } from '@/math';
import { TRUE_MODEL, inputWith, marksOf } from './helpers';
import { elements, numberAttribute, onCurveExtent, parseSvg } from './svg-helpers';

const fit: FitResult = fitSight(inputWith(marksOf(TRUE_MODEL, [20, 40, 60])));

function ticksOf(svg: string) {
  return elements(parseSvg(svg), 'line').filter((line) => line.hasAttribute('data-distance'));
}

describe('tape SVG', () => {
  const svg = tapeSvg(fit, { from: 20, to: 100, step: 1, widthMm: 12, orientation: 'down' });
  const root = parseSvg(svg).documentElement!;

  it('is sized in millimetres with a viewBox in millimetres (one user unit = 1 mm)', () => {
    expect(root.getAttribute('width')).toBe('12mm');
    const height = root.getAttribute('height')!;
    expect(height).toMatch(/^\d+(\.\d+)?mm$/);
    expect(root.getAttribute('viewBox')).toBe(`0 0 12 ${height.replace('mm', '')}`);
    // No fonts: no text elements, no font-family anywhere.
    expect(elements(root, 'text')).toHaveLength(0);
    expect(svg).not.toMatch(/font-family/);
  });

  it('puts every tick, one per yard, at its fitted mark to 0.01 mm (unrounded)', () => {
    const ticks = ticksOf(svg);
    expect(ticks.map((tick) => Number(tick.getAttribute('data-distance')))).toEqual(Array.from({ length: 81 }, (_, i) => 20 + i));
    const marks = ticks.map((tick) => predictMarkMm(fit.model, Number(tick.getAttribute('data-distance'))));
    const lowest = Math.min(...marks);
    const layout = tapeLayout(fit.model, { from: 20, to: 100 });
    ticks.forEach((tick, i) => {
      const offset = numberAttribute(tick, 'data-offset-mm');
      expect(numberAttribute(tick, 'y1')).toBeCloseTo(offset, 10);
      expect(numberAttribute(tick, 'y2')).toBeCloseTo(offset, 10);
      expect(Math.abs(offset - (layout.marginMm + marks[i] - lowest))).toBeLessThan(0.01);
    });
    // Against the fit's own predictions every 10 yd: tick spacing equals mark spacing.
    const at = (distance: number) =>
      numberAttribute(ticks.find((tick) => tick.getAttribute('data-distance') === String(distance))!, 'data-offset-mm');
    const predicted = (distance: number) => fit.marks.find((mark) => mark.distance === distance)!.markMm;
    for (const distance of [30, 40, 50, 60, 70, 80, 90, 100])
      expect(Math.abs(at(distance) - at(20) - (predicted(distance) - predicted(20)))).toBeLessThan(0.01);
    // The height covers every tick with its margins.
    expect(numberAttribute(root, 'height') || Number(root.getAttribute('height')!.replace('mm', ''))).toBeCloseTo(
      2 * layout.marginMm + Math.max(...marks) - lowest,
      3,
    );
  });

  it('has longer ticks and numerals every 5 and 10, numerals at least 1.6 mm tall', () => {
    const ticks = ticksOf(svg);
    const length = (tick: (typeof ticks)[number]) => numberAttribute(tick, 'x2') - numberAttribute(tick, 'x1');
    const byDistance = new Map(ticks.map((tick) => [Number(tick.getAttribute('data-distance')), tick]));
    expect(length(byDistance.get(50)!)).toBeGreaterThan(length(byDistance.get(45)!));
    expect(length(byDistance.get(45)!)).toBeGreaterThan(length(byDistance.get(44)!));
    const numerals = elements(root, 'path').filter((path) => path.hasAttribute('data-numeral'));
    const numbered = numerals.map((path) => Number(path.getAttribute('data-numeral')));
    for (let distance = 20; distance <= 100; distance += 10) expect(numbered).toContain(distance);
    expect(numbered.every((distance) => distance % 5 === 0)).toBe(true);
    for (const numeral of numerals) {
      expect(numeral.getAttribute('aria-label')).toBe(numeral.getAttribute('data-numeral'));
      const extent = onCurveExtent(numeral);
      expect(extent.maxY - extent.minY).toBeGreaterThanOrEqual(1.6);
      expect(extent.maxX).toBeLessThanOrEqual(12); // inside the tape
      // Centred on its tick.
      const tickOffset = numberAttribute(byDistance.get(Number(numeral.getAttribute('data-numeral')))!, 'data-offset-mm');
      expect(Math.abs((extent.maxY + extent.minY) / 2 - tickOffset)).toBeLessThan(0.15);
    }
    // Numerals never overlap one another.
    const spans = numerals.map(onCurveExtent).sort((a, b) => a.minY - b.minY);
    spans.slice(1).forEach((span, i) => expect(span.minY).toBeGreaterThan(spans[i].maxY));
  });

  it('reverses for numbers up and moves the ticks to the right edge when mirrored', () => {
    const down = ticksOf(svg);
    const upSvg = tapeSvg(fit, { from: 20, to: 100, orientation: 'up', mirror: true });
    const up = ticksOf(upSvg);
    const length = Number(parseSvg(upSvg).documentElement!.getAttribute('height')!.replace('mm', ''));
    up.forEach((tick, i) => {
      expect(Math.abs(numberAttribute(tick, 'data-offset-mm') - (length - numberAttribute(down[i], 'data-offset-mm')))).toBeLessThan(1e-3);
      expect(numberAttribute(tick, 'x1')).toBeCloseTo(12, 9);
      expect(numberAttribute(tick, 'x2')).toBeLessThan(12);
    });
  });

  it('draws a metre tape from a fit in yards, and half-yard steps', () => {
    const metres = ticksOf(tapeSvg(fit, { from: 20, to: 90, unit: 'm' }));
    expect(metres).toHaveLength(71);
    const marks = metres.map((tick) => predictMarkMm(fit.model, metresToYards(Number(tick.getAttribute('data-distance')))));
    metres.forEach((tick, i) =>
      expect(
        Math.abs(numberAttribute(tick, 'data-offset-mm') - numberAttribute(metres[0], 'data-offset-mm') - (marks[i] - marks[0])),
      ).toBeLessThan(0.01),
    );
    const half = ticksOf(tapeSvg(fit, { from: 20, to: 30, step: 0.5 }));
    expect(half.map((tick) => Number(tick.getAttribute('data-distance')))).toEqual(Array.from({ length: 21 }, (_, i) => 20 + i / 2));
  });

  it('refuses options that make no tape, naming the field', () => {
    const refuse = (options: object, field: string) => {
      try {
        tapeSvg(fit, options);
      } catch (error) {
        expect(error).toBeInstanceOf(FitInputError);
        expect((error as FitInputError).field).toBe(field);
        return;
      }
      throw new Error('expected a refusal');
    };
    refuse({ step: 0.3 }, 'tape.step');
    refuse({ from: 60, to: 40 }, 'tape.to');
    refuse({ widthMm: 3 }, 'tape.widthMm');
    refuse({ numeralHeightMm: 1.2 }, 'tape.numeralHeightMm');
    refuse({ orientation: 'sideways' }, 'tape.orientation');
    expect(() => tapeSvg({ model: { ...fit.model, speedFps: 125 } }, { to: 150 })).toThrow(/cannot reach/);
  });
});
