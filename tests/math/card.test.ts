import {
  fitSight,
  fieldCard,
  fieldCardData,
  fieldCardSvg,
  predictedTapeSvg,
  tapeSvg,
  predictMarkMm,
  airDensityKgM3,
  withArrow,
  FIELD_CARD_SIZE_MM,
  PREDICTED_CAUTION,
  SLOPE_CAUTION,
  WIND_CAUTION,
  crosswindDriftM,
  type SightModel,
} from '@/math';
import { TRUE_MODEL, inputWith, marksOf } from './helpers';
import { elements, numberAttribute, onCurveExtent, parseSvg } from './svg-helpers';

const fit = fitSight(inputWith(marksOf(TRUE_MODEL, [20, 40, 60])));
const labels = { bow: 'Ridgeback test bow', build: 'Test heavy', date: '2026-11-14', place: 'Invented meadow' };

/** A sight-in at 2280 m and −2 °C (the fit's air is the sight-in's). */
const mountainSightIn = fitSight(
  inputWith(marksOf({ ...TRUE_MODEL, airDensityKgM3: airDensityKgM3({ altitudeM: 2280, temperatureC: -2 }) }, [20, 40, 60]), {
    air: { altitudeM: 2280, temperatureC: -2 },
  }),
);

describe('field card data', () => {
  it('in the sight-in air is the slope table of fieldCard, cell by cell, with no shift', () => {
    const card = fieldCardData(fit.model, { sightIn: { altitudeM: 0, temperatureC: null } });
    const reference = fieldCard(fit.model);
    expect(card.sameAirAsSightIn).toBe(true);
    expect(card.rows).toHaveLength(reference.rows.length);
    card.rows.forEach((row, i) => {
      const expected = reference.rows[i];
      expect([row.angleDeg, row.distance]).toEqual([expected.angleDeg, expected.distance]);
      expect(row.markMm!).toBeCloseTo(expected.markMm, 9);
      if (expected.aimAsIf === null) expect(row.aimAsIf).toBeNull();
      else expect(row.aimAsIf!).toBeCloseTo(expected.aimAsIf, 6);
      expect(row.horizontal).toBeCloseTo(expected.horizontal, 12);
    });
    card.shift.forEach((row) => expect(row.shiftMm).toBe(0));
    expect(card.cautions[0]).toBe(SLOPE_CAUTION);
    expect(card.cautions.join(' ')).toMatch(/hunting rules/);
  });

  it('for a sight-in at altitude: no shift in its own air, up the scale higher up, down it lower down, growing with altitude', () => {
    const model = mountainSightIn.model;
    const distances = [20, 40, 60, 80];
    const at = (altitudeM: number, temperatureC?: number) =>
      fieldCardData(model, { distances, anglesDeg: [0], air: { altitudeM, temperatureC }, sightIn: { altitudeM: 2280, temperatureC: -2 } });
    at(2280, -2).shift.forEach((row) => expect(Math.abs(row.shiftMm!)).toBeLessThan(1e-9));
    at(2280, -2).rows.forEach((row) => expect(row.aimAsIf!).toBeCloseTo(row.distance, 3));
    const higher = at(2700, -2);
    const highest = at(3500, -2);
    const lower = at(600, -2);
    higher.shift.forEach((row, i) => {
      expect(row.shiftMm!).toBeLessThan(0);
      expect(highest.shift[i].shiftMm!).toBeLessThan(row.shiftMm!);
      expect(lower.shift[i].shiftMm!).toBeGreaterThan(0);
    });
    // The shift falls towards zero as the altitude comes back to the sight-in's.
    const nearly = at(2300, -2);
    nearly.shift.forEach((row, i) => expect(Math.abs(row.shiftMm!)).toBeLessThan(Math.abs(higher.shift[i].shiftMm!) / 10));
    // Level in thinner air, the tape must be set for a shorter distance.
    higher.rows.filter((row) => row.distance >= 40).forEach((row) => expect(row.aimAsIf!).toBeLessThan(row.distance));
  });

  it('holds the mark of the card’s air on the slope, and the aim-as-if distance has that mark on the sight-in tape', () => {
    const card = fieldCardData(fit.model, { anglesDeg: [-30, 30], distances: [40], air: { altitudeM: 2700, temperatureC: 5 } });
    const there: SightModel = { ...fit.model, airDensityKgM3: airDensityKgM3({ altitudeM: 2700, temperatureC: 5 }) };
    for (const row of card.rows) {
      expect(row.markMm!).toBeCloseTo(predictMarkMm(there, 40, row.angleDeg), 9);
      expect(Math.abs(predictMarkMm(fit.model, row.aimAsIf!) - row.markMm!)).toBeLessThan(1e-4);
    }
    expect(card.air).toEqual({ altitudeM: 2700, temperatureC: 5, airDensityKgM3: there.airDensityKgM3 });
  });

  it('reads marks as an upward-growing scale does, and refuses angles past 60°', () => {
    const down = fieldCardData(fit.model, { anglesDeg: [-20], distances: [30] });
    const up = fieldCardData(fit.model, { anglesDeg: [-20], distances: [30], scaleSign: -1 });
    expect(up.rows[0].markMm!).toBeCloseTo(-down.rows[0].markMm!, 12);
    expect(up.rows[0].aimAsIf!).toBeCloseTo(down.rows[0].aimAsIf!, 12);
    expect(up.scaleDirection).toBe('up');
    expect(() => fieldCardData(fit.model, { anglesDeg: [75] })).toThrow(/between -60 and 60/);
  });
});

describe('field card SVG', () => {
  const busiest = fieldCardData(fit.model, {
    anglesDeg: [-40, -30, -20, -10, 0, 10, 20, 30, 40],
    distances: [20, 30, 40, 50, 60, 70],
    air: { altitudeM: 2700, temperatureC: -12 },
    sightIn: { altitudeM: 640, temperatureC: 19 },
  });
  const svg = fieldCardSvg(busiest, labels);
  const doc = parseSvg(svg);
  const root = doc.documentElement!;

  it('is 100 × 150 mm with a viewBox in mm', () => {
    expect(root.getAttribute('width')).toBe(`${FIELD_CARD_SIZE_MM.widthMm}mm`);
    expect(root.getAttribute('height')).toBe(`${FIELD_CARD_SIZE_MM.heightMm}mm`);
    expect(root.getAttribute('viewBox')).toBe('0 0 100 150');
  });

  it('has no <text>: every word is an outline path, at least 1.6 mm tall, inside the card', () => {
    expect(elements(doc, 'text')).toHaveLength(0);
    expect(svg).not.toMatch(/<text[\s>]/);
    const paths = elements(doc, 'path');
    expect(paths.length).toBeGreaterThan(150);
    for (const path of paths) {
      expect(path.getAttribute('aria-label')).toBeTruthy();
      const scale = Number(/matrix\(([^ ]+)/.exec(path.getAttribute('transform') ?? '')?.[1]);
      // Digit heights: 700 font units in the numeral face, 668 in the small-print face (glyphs.ts), so scale·700 ≥ the size.
      expect(scale * 700).toBeGreaterThanOrEqual(1.6 - 1e-6);
      const extent = onCurveExtent(path);
      expect(extent.minX).toBeGreaterThanOrEqual(0);
      expect(extent.maxX).toBeLessThanOrEqual(100);
      expect(extent.minY).toBeGreaterThanOrEqual(0);
      expect(extent.maxY).toBeLessThanOrEqual(150);
    }
    expect(numberAttribute(root, 'data-content-bottom-mm')).toBeLessThan(146);
  });

  it('carries every box’s figures, the air, the shift and the cautions', () => {
    const cells = elements(doc, 'g').filter((g) => g.getAttribute('class') === 'cell');
    expect(cells).toHaveLength(54);
    for (const cell of cells) {
      const row = busiest.rows.find(
        (candidate) =>
          candidate.angleDeg === numberAttribute(cell, 'data-angle') && candidate.distance === numberAttribute(cell, 'data-distance'),
      )!;
      expect(numberAttribute(cell, 'data-mark-mm')).toBeCloseTo(row.markMm!, 9);
      const words = elements(cell, 'path').map((path) => path.getAttribute('aria-label'));
      expect(words[0]).toBe(row.markMm!.toFixed(1));
      expect(words[1]).toBe(row.aimAsIf === null ? '≈ none' : `≈ ${row.aimAsIf.toFixed(1)}`);
    }
    const words = elements(doc, 'path').map((path) => path.getAttribute('aria-label'));
    expect(words).toContain('Marks for 2700 m, −12 °C');
    expect(words).toContain('Sight-in air: 640 m, 19 °C');
    expect(words).toContain(SLOPE_CAUTION);
    expect(words.join(' ')).toMatch(/Follow the hunting rules/);
    const shifts = elements(doc, 'g').filter((g) => g.getAttribute('data-row') === 'shift');
    expect(shifts).toHaveLength(6);
  });
});

describe('field card wind table', () => {
  it('gives drift (cm, in) and hold (mm) for 5, 10, 15 mph at each card distance, in the card air, from crosswindDriftM', () => {
    const card = fieldCardData(fit.model, { distances: [20, 40, 60], air: { altitudeM: 2700 } });
    expect(card.wind.speedUnit).toBe('mph');
    expect(card.wind.rows.map((row) => row.speed)).toEqual([5, 10, 15]);
    const there = { ...fit.model, airDensityKgM3: card.air.airDensityKgM3 };
    for (const row of card.wind.rows) {
      expect(row.crossMps).toBeCloseTo(row.speed * 0.44704, 12); // 1 mph = 0.44704 m/s exactly
      for (const cell of row.cells) {
        const drift = crosswindDriftM(there, cell.distance, row.crossMps);
        expect(cell.driftCm!).toBeCloseTo(drift * 100, 9);
        expect(cell.driftIn!).toBeCloseTo((drift * 1000) / 25.4, 9);
        expect(cell.holdMm!).toBeCloseTo((drift * 1000 * fit.model.sightRadiusMm) / 1000 / (cell.distance * 0.9144), 9);
      }
      // Grows with distance.
      expect(row.cells[2].driftCm!).toBeGreaterThan(row.cells[1].driftCm!);
    }
    expect(card.wind.caution).toBe(WIND_CAUTION);
  });

  it('uses km/h (8, 16, 24) for an archer in metres', () => {
    const metric = fieldCardData({ ...fit.model, distanceUnit: 'm' }, { distances: [20, 40] });
    expect(metric.wind.speedUnit).toBe('km/h');
    expect(metric.wind.rows.map((row) => row.speed)).toEqual([8, 16, 24]);
    expect(metric.wind.rows[0].crossMps).toBeCloseTo(8 / 3.6, 12);
  });

  it('is printed on the card with its caution, inside the card', () => {
    const card = fieldCardData(fit.model, { distances: [20, 30, 40, 50, 60, 70], air: { altitudeM: 2700, temperatureC: -12 } });
    const doc = parseSvg(fieldCardSvg(card, labels));
    const cells = elements(doc, 'g').filter((g) => g.getAttribute('data-wind') !== null && g.getAttribute('data-wind') !== '');
    expect(cells).toHaveLength(18);
    const ten60 = cells.find((g) => g.getAttribute('data-wind') === '10' && g.getAttribute('data-distance') === '60')!;
    const cell = card.wind.rows[1].cells[4];
    expect(numberAttribute(ten60, 'data-hold-mm')).toBeCloseTo(cell.holdMm!, 9);
    expect(elements(ten60, 'path').map((path) => path.getAttribute('aria-label'))).toEqual([
      `${cell.driftIn!.toFixed(1)}/${cell.driftCm! < 9.95 ? cell.driftCm!.toFixed(1) : cell.driftCm!.toFixed(0)}`,
      cell.holdMm!.toFixed(1),
    ]);
    const words = elements(doc, 'path')
      .map((path) => path.getAttribute('aria-label') ?? '')
      .join(' ');
    expect(words).toContain('Wind varies along the path');
    expect(words).toContain('only practice in wind');
    expect(numberAttribute(doc.documentElement!, 'data-content-bottom-mm')).toBeLessThan(146);
  });
});

describe('predicted tape SVG', () => {
  const model = withArrow(fit.model, { massGr: 520, diameterMm: 6.5, speedFps: 262 });
  const svg = predictedTapeSvg(
    model,
    { from: 20, to: 80 },
    { bow: 'Ridgeback test bow', build: 'Elk brass', speed: '262 fps (predicted)' },
  );
  const doc = parseSvg(svg);

  it('draws the same tape as a sighted one of that model, true to size', () => {
    const plain = parseSvg(tapeSvg({ model }, { from: 20, to: 80 }));
    const offsets = (d: typeof doc) =>
      elements(d, 'line').map((line) => [line.getAttribute('data-distance'), line.getAttribute('data-offset-mm')]);
    expect(offsets(doc)).toEqual(offsets(plain));
    expect(doc.documentElement!.getAttribute('width')).toMatch(/^[\d.]+mm$/);
    expect(doc.documentElement!.getAttribute('data-predicted')).toBe('true');
  });

  it('says PREDICTED — not sighted beside the tape and along it, in outlines only', () => {
    expect(elements(doc, 'text')).toHaveLength(0);
    const words = elements(doc, 'path').map((path) => path.getAttribute('aria-label') ?? '');
    expect(words.filter((word) => word !== '').join(' ')).toContain(PREDICTED_CAUTION.slice(0, 24));
    expect(words.filter((word) => word === 'PREDICTED · NOT SIGHTED').length).toBeGreaterThanOrEqual(1);
    expect(words).toContain('Elk brass');
  });
});
