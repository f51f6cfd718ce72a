import * as math from 'mathjs';
import {
  FOOT_POUND_J,
  GRAIN_KG,
  INCH_MM,
  POUND_FORCE_N,
  SLUG_KG,
  STANDARD_GRAVITY_MPS2,
  YARD_M,
  distanceToMetres,
  fpsToMps,
  grainsToGrams,
  grainsToKg,
  gramsToGrains,
  inchesToMm,
  lengthToMm,
  metresToDistance,
  metresToYards,
  mmToInches,
  mpsToFps,
  yardsToMetres,
  degToRad,
  radToDeg,
  celsiusToKelvin,
} from '@/math/units';

// Reference: mathjs 14 unit definitions (international yard and pound, 1959;
// grain 64.79891 mg; lbf = lb × standard gravity; gravity constant 9.80665 m/s², 3rd CGPM).
const inUnit = (expression: string, unit: string) => math.evaluate(expression).toNumber(unit);

describe('exact unit definitions', () => {
  it('match mathjs for yard, inch, grain, lbf, ft·lbf, slug and gravity', () => {
    expect(YARD_M).toBeCloseTo(inUnit('1 yard', 'm'), 15);
    expect(INCH_MM).toBeCloseTo(inUnit('1 inch', 'mm'), 13);
    expect(GRAIN_KG).toBeCloseTo(inUnit('1 grain', 'kg'), 18);
    expect(POUND_FORCE_N).toBeCloseTo(inUnit('1 lbf', 'N'), 12);
    expect(FOOT_POUND_J).toBeCloseTo(inUnit('1 ft lbf', 'J'), 12);
    expect(SLUG_KG).toBeCloseTo(inUnit('1 lbf s^2 / ft', 'kg'), 11);
    expect(STANDARD_GRAVITY_MPS2).toBeCloseTo(math.evaluate('gravity').toNumber('m/s^2'), 12);
  });

  it('convert distances, lengths, masses and speeds like mathjs', () => {
    expect(yardsToMetres(60)).toBeCloseTo(inUnit('60 yard', 'm'), 12);
    expect(metresToYards(50)).toBeCloseTo(inUnit('50 m', 'yard'), 12);
    expect(inchesToMm(2)).toBeCloseTo(inUnit('2 inch', 'mm'), 12);
    expect(mmToInches(820)).toBeCloseTo(inUnit('820 mm', 'inch'), 12);
    expect(grainsToKg(420)).toBeCloseTo(inUnit('420 grain', 'kg'), 15);
    expect(grainsToGrams(420)).toBeCloseTo(inUnit('420 grain', 'g'), 12);
    expect(gramsToGrains(27)).toBeCloseTo(inUnit('27 g', 'grain'), 10);
    expect(fpsToMps(285)).toBeCloseTo(inUnit('285 ft/s', 'm/s'), 12);
    expect(mpsToFps(90)).toBeCloseTo(inUnit('90 m/s', 'ft/s'), 10);
    expect(degToRad(30)).toBeCloseTo(inUnit('30 deg', 'rad'), 14);
    expect(radToDeg(1)).toBeCloseTo(inUnit('1 rad', 'deg'), 12);
    expect(celsiusToKelvin(15)).toBeCloseTo(inUnit('15 degC', 'K'), 10);
  });

  it('round-trip by unit name at the edge', () => {
    expect(distanceToMetres(20, 'yd')).toBeCloseTo(18.288, 12);
    expect(distanceToMetres(20, 'm')).toBe(20);
    expect(metresToDistance(distanceToMetres(37, 'yd'), 'yd')).toBeCloseTo(37, 12);
    expect(lengthToMm(1, 'in')).toBeCloseTo(25.4, 12);
    expect(lengthToMm(7, 'mm')).toBe(7);
  });
});
