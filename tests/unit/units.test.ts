import fc from 'fast-check';

import {
  airInUnits,
  formatQuantity,
  fromStored,
  localeDateOrder,
  messageInUnits,
  parseDateText,
  parseQuantity,
  shownUnit,
  storedToText,
  toStored,
  unitDefaultsFor,
  type Quantity,
  type UnitPreferences,
} from '@/shared/units';
import { bowInputSchema } from '@/shared/bow';
import { measureSchema } from '@/shared/common';

const imperial: UnitPreferences = unitDefaultsFor('yd');
const metric: UnitPreferences = unitDefaultsFor('m');
const close = (actual: number | undefined, expected: number, digits = 9) => expect(actual).toBeCloseTo(expected, digits);

describe('unit defaults from the first choice', () => {
  it('yards bring inches, feet, °F, fps and grains; metres bring mm, m, °C, m/s and grains', () => {
    expect(imperial).toEqual({
      distanceUnit: 'yd',
      lengthUnit: 'in',
      altitudeUnit: 'ft',
      temperatureUnit: 'F',
      speedUnit: 'fps',
      massUnit: 'gr',
    });
    expect(metric).toEqual({
      distanceUnit: 'm',
      lengthUnit: 'mm',
      altitudeUnit: 'm',
      temperatureUnit: 'C',
      speedUnit: 'mps',
      massUnit: 'gr',
    });
  });
  it('names the shown unit of each quantity', () => {
    expect((['length', 'altitude', 'temperature', 'speed', 'mass'] as Quantity[]).map((q) => shownUnit(q, imperial))).toEqual([
      'in',
      'ft',
      '°F',
      'fps',
      'gr',
    ]);
    expect((['length', 'altitude', 'temperature', 'speed', 'mass'] as Quantity[]).map((q) => shownUnit(q, metric))).toEqual([
      'mm',
      'm',
      '°C',
      'm/s',
      'gr',
    ]);
  });
});

describe('exact factors (international yard and pound agreement, 1959; °F = °C × 9/5 + 32)', () => {
  it('1 in = 25.4 mm, 1 ft = 0.3048 m, 1 gr = 0.06479891 g, 1 fps = 0.3048 m/s', () => {
    close(toStored(1, 'length', imperial), 25.4, 12);
    close(toStored(1, 'altitude', imperial), 0.3048, 12);
    close(toStored(0.06479891, 'mass', { massUnit: 'g' }), 1, 12);
    close(toStored(0.3048, 'speed', metric), 1, 12);
  });
  it('water freezes at 32 °F and boils at 212 °F; −40 is the same on both scales', () => {
    close(toStored(32, 'temperature', imperial), 0, 12);
    close(toStored(212, 'temperature', imperial), 100, 12);
    close(toStored(-40, 'temperature', imperial), -40, 12);
    close(fromStored(37, 'temperature', imperial), 98.6, 12);
  });
  it('a metric archer sees stored mm, m and °C unchanged', () => {
    expect(toStored(723.9, 'length', metric)).toBe(723.9);
    expect(toStored(2800, 'altitude', metric)).toBe(2800);
    expect(toStored(-5, 'temperature', metric)).toBe(-5);
  });
  it('round trips: stored → shown → stored gives the value back, for every quantity and either choice', () => {
    const quantities: Quantity[] = ['length', 'altitude', 'temperature', 'speed', 'mass'];
    fc.assert(
      fc.property(
        fc.constantFrom(...quantities),
        fc.constantFrom(imperial, metric, { ...metric, massUnit: 'g' as const }),
        fc.double({ min: -5000, max: 5000, noNaN: true }),
        (quantity, units, stored) => {
          const back = toStored(fromStored(stored, quantity, units), quantity, units);
          expect(Math.abs(back - stored)).toBeLessThanOrEqual(1e-9 * Math.max(1, Math.abs(stored)));
        },
      ),
    );
  });
  it('round trips through the input text to the input’s rounding (1/1000 in = 0.0254 mm)', () => {
    fc.assert(
      fc.property(fc.double({ min: 300, max: 900, noNaN: true }), (mm) => {
        const text = storedToText(mm, 'length', imperial);
        const back = parseQuantity(text, 'length', imperial).value as number;
        expect(Math.abs(back - mm)).toBeLessThanOrEqual(0.0127 + 1e-9);
      }),
    );
  });
});

describe('typed values', () => {
  it('"28.5" for a yards archer is 28.5 in = 723.9 mm, a draw length the bow schema accepts', () => {
    const drawLengthMm = parseQuantity('28.5', 'length', imperial).value;
    close(drawLengthMm, 723.9);
    const base = {
      nickname: 'Test',
      hand: 'right',
      drawWeightLb: 60,
      sightKind: 'single-pin-slider',
      sightRadiusMm: 840,
      peepHeightMm: 110,
    };
    expect(bowInputSchema.safeParse({ ...base, drawLengthMm }).success).toBe(true);
  });
  it('a unit typed after the number wins over the field’s: "28.5 in" in a mm field, "724 mm" in an inch field', () => {
    close(parseQuantity('28.5 in', 'length', metric).value, 723.9);
    close(parseQuantity('28.5"', 'length', metric).value, 723.9);
    close(parseQuantity('724 mm', 'length', imperial).value, 724);
    close(parseQuantity('9200 ft', 'altitude', metric).value, 2804.16);
    close(parseQuantity('9200', 'altitude', imperial).value, 2804.16);
    close(parseQuantity('41 °F', 'temperature', metric).value, 5);
    close(parseQuantity('41F', 'temperature', metric).value, 5);
    close(parseQuantity('5 °C', 'temperature', imperial).value, 5);
  });
  it('accepts a decimal comma and thousands separators', () => {
    close(parseQuantity('28,5', 'length', imperial).value, 723.9);
    close(parseQuantity('9,200', 'altitude', imperial).value, 2804.16);
    close(parseQuantity('9 200 ft', 'altitude', metric).value, 2804.16);
  });
  it('empty is undefined; a letter in the number or a foreign unit is a message', () => {
    expect(parseQuantity('  ', 'length', imperial)).toEqual({ value: undefined });
    expect(parseQuantity('2g.5', 'length', imperial).error).toBe('must be a number');
    expect(parseQuantity('28.5 kg', 'length', imperial).error).toBe('“kg” is not a unit for this field: type in or mm');
    expect(parseQuantity('abc', 'altitude', imperial).error).toBe('must be a number');
  });
});

describe('shown values', () => {
  it('inputs carry no float noise', () => {
    expect(storedToText(723.9, 'length', imperial)).toBe('28.5');
    expect(storedToText(2804.16, 'altitude', imperial)).toBe('9200');
    expect(storedToText(5, 'temperature', imperial)).toBe('41');
    expect(storedToText(null, 'temperature', imperial)).toBe('');
  });
  it('formatted values carry their unit', () => {
    expect(formatQuantity(723.9, 'length', imperial)).toBe('28.50 in');
    expect(formatQuantity(10, 'temperature', imperial)).toBe('50 °F');
    expect(formatQuantity(91.44, 'speed', { speedUnit: 'fps' })).toBe('91 fps');
    expect(formatQuantity(300, 'speed', metric)).toBe('91.4 m/s');
    expect(formatQuantity(undefined, 'mass', metric)).toBe('—');
  });
});

describe('air in words', () => {
  it('states a sight-in’s air in the archer’s units, and what is assumed when missing', () => {
    expect(airInUnits({ altitudeM: 2804.16, temperatureC: 5 }, imperial)).toBe('9200 ft, 41 °F');
    expect(airInUnits({ altitudeM: 2804.16, temperatureC: -10 }, metric)).toBe('2804 m, −10 °C');
    expect(airInUnits({ altitudeM: null, temperatureC: null }, imperial)).toBe('sea level (assumed), standard temperature');
  });
});

describe('limits stated in the shown unit', () => {
  it('the "28.5 mm" draw length message becomes inches for an inch archer', () => {
    expect(messageInUnits('Draw length must be at least 500 mm', imperial)).toBe('Draw length must be at least 19.69 in');
    expect(messageInUnits('Draw length must be at most 900 mm', imperial)).toBe('Draw length must be at most 35.43 in');
    expect(messageInUnits('Draw length must be at least 500 mm', metric)).toBe('Draw length must be at least 500 mm');
  });
  it('lower limits round up and upper limits down, so the stated number is itself accepted', () => {
    // 500 mm = 19.685 in: "at least 19.69 in" → 500.126 mm, inside the limit.
    const stated = Number(/([\d.]+) in/.exec(messageInUnits('Draw length must be at least 500 mm', imperial))![1]);
    expect(toStored(stated, 'length', imperial)).toBeGreaterThanOrEqual(500);
    // The sight-in form's altitude field (shared/sightIn.ts): measureSchema('Altitude', 'm', -500, 5000).
    const issue = (value: number) => measureSchema('Altitude', 'm', -500, 5000).safeParse(value);
    const message = issue(9000).error!.issues[0].message;
    expect(message).toBe('Altitude must be at most 5000 m');
    const feet = messageInUnits(message, imperial);
    expect(feet).toBe('Altitude must be at most 16404 ft');
    expect(issue(toStored(16404, 'altitude', imperial)).success).toBe(true);
  });
  it('states temperature, speed, mass and ranges in the shown unit', () => {
    expect(messageInUnits('Temperature must be at most 50 °C', imperial)).toBe('Temperature must be at most 122 °F');
    expect(messageInUnits('Temperature must be at least -40 °C', imperial)).toBe('Temperature must be at least -40 °F');
    expect(messageInUnits('Enter an altitude between -500 and 5000 m', imperial)).toBe('Enter an altitude between -1640 and 16404 ft');
    expect(messageInUnits('Chronographed speed must be at least 120 fps', metric)).toBe('Chronographed speed must be at least 36.6 m/s');
    expect(messageInUnits('Point weight must be at most 500 gr', { massUnit: 'g' })).toBe('Point weight must be at most 32.3 g');
  });
  it('leaves distances alone when asked to convert lengths only', () => {
    expect(messageInUnits('Marks must be at most 150 m apart; tape width 40 mm', imperial, ['length'])).toBe(
      'Marks must be at most 150 m apart; tape width 1.57 in',
    );
  });
});

describe('dates as typed', () => {
  it('ISO dates pass; impossible ones are named', () => {
    expect(parseDateText('2026-12-02', null)).toEqual({ iso: '2026-12-02' });
    expect(parseDateText('2026-02-30', null).error).toBe('2026-02-30 is not a date that exists');
    expect(parseDateText('', 'MDY').error).toBe('Enter the date');
  });
  it('12/02/2026 is read in the locale’s order, and the note says how', () => {
    expect(parseDateText('12/02/2026', 'MDY')).toEqual({
      iso: '2026-12-02',
      note: 'Read as 2 December 2026 (month first); if you meant 12 February 2026, enter it as YYYY-MM-DD',
    });
    expect(parseDateText('12/02/2026', 'DMY').iso).toBe('2026-02-12');
    expect(parseDateText('02.12.26', 'DMY').iso).toBe('2026-12-02');
  });
  it('without a known order a two-way date is refused with both readings', () => {
    expect(parseDateText('12/02/2026', null).error).toBe(
      '12/02/2026 could be 12 February 2026 or 2 December 2026: enter it as YYYY-MM-DD or pick it',
    );
  });
  it('a date with only one reading is read that way whatever the locale', () => {
    expect(parseDateText('31/12/2026', 'MDY')).toEqual({ iso: '2026-12-31' });
    expect(parseDateText('12/31/2026', 'DMY')).toEqual({ iso: '2026-12-31' });
    expect(parseDateText('12/12/2026', null)).toEqual({ iso: '2026-12-12' });
    expect(parseDateText('31/31/2026', 'DMY').error).toBe('31/31/2026 is not a date that exists');
    expect(parseDateText('next tuesday', 'DMY').error).toMatch(/YYYY-MM-DD/);
  });
  it('knows the order of common locales (Intl, CLDR data)', () => {
    expect(localeDateOrder('en-US')).toBe('MDY');
    expect(localeDateOrder('en-GB')).toBe('DMY');
    expect(localeDateOrder('de-DE')).toBe('DMY');
  });
});
