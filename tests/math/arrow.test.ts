import * as math from 'mathjs';
import { ENERGY_CAUTION } from '@/math/cautions';
import { focPercent, kineticEnergy, momentum, totalArrowGrains, tradeKineticEnergyFtLbf } from '@/math/arrow';

describe('arrow quantities', () => {
  it('adds up total grains from the components', () => {
    expect(
      totalArrowGrains({ shaftGpi: 9.5, cutLengthIn: 28.5, pointGr: 100, insertGr: 16, nockGr: 9, vaneCount: 3, vaneGr: 6 }),
    ).toBeCloseTo(413.75, 10);
    expect(totalArrowGrains({ shaftGpi: 8, cutLengthIn: 29, wrapGr: 4, collarGr: 10 })).toBeCloseTo(246, 10);
    expect(totalArrowGrains({ shaftGpi: 0, cutLengthIn: 0 })).toBe(0);
    expect(() => totalArrowGrains({ shaftGpi: -1, cutLengthIn: 28 })).toThrow(RangeError);
    expect(() => totalArrowGrains({ shaftGpi: 9, cutLengthIn: 28, vaneCount: Number.NaN })).toThrow(RangeError);
  });

  it('computes FOC as 100·(B − L/2)/L (common practice, no published source)', () => {
    expect(focPercent({ balancePoint: 16.5, arrowLength: 28.5 })).toBeCloseTo((100 * (16.5 - 14.25)) / 28.5, 12);
    expect(focPercent({ balancePoint: 14, arrowLength: 28 })).toBeCloseTo(0, 12);
    expect(() => focPercent({ balancePoint: 30, arrowLength: 28 })).toThrow(RangeError);
    expect(() => focPercent({ balancePoint: 10, arrowLength: 0 })).toThrow(RangeError);
  });

  it('computes kinetic energy exactly, as mathjs does from ½·m·v²', () => {
    const energy = kineticEnergy({ massGr: 420, speedFps: 285 });
    // Reference: mathjs unit arithmetic.
    const reference = math.evaluate('0.5 * 420 grain * (285 ft/s)^2');
    expect(energy.joules).toBeCloseTo(reference.toNumber('J'), 10);
    expect(energy.footPounds).toBeCloseTo(reference.toNumber('ft lbf'), 10);
  });

  it('agrees with the trade shortcut grains·fps²/450240 within 0.05 % (common practice, no published source)', () => {
    for (const [massGr, speedFps] of [
      [300, 340],
      [420, 285],
      [650, 240],
    ]) {
      const exact = kineticEnergy({ massGr, speedFps }).footPounds;
      const trade = tradeKineticEnergyFtLbf({ massGr, speedFps });
      const difference = Math.abs(trade - exact) / exact;
      expect(difference).toBeLessThan(0.0005);
      expect(difference).toBeGreaterThan(0.0003); // the shortcut's constant is not the exact 450,437
    }
  });

  it('computes momentum in kg·m/s and slug·ft/s as mathjs does', () => {
    const push = momentum({ massGr: 420, speedFps: 285 });
    const reference = math.evaluate('420 grain * 285 ft/s');
    expect(push.kilogramMetresPerSecond).toBeCloseTo(reference.toNumber('kg m/s'), 12);
    expect(push.slugFeetPerSecond).toBeCloseTo(reference.toNumber('lbf s'), 12); // 1 slug·ft/s = 1 lbf·s
  });

  it('refuses a massless or negative-speed arrow, and carries the energy caution', () => {
    expect(() => kineticEnergy({ massGr: 0, speedFps: 280 })).toThrow(RangeError);
    expect(() => momentum({ massGr: 400, speedFps: -1 })).toThrow(RangeError);
    expect(() => tradeKineticEnergyFtLbf({ massGr: Number.NaN, speedFps: 280 })).toThrow(RangeError);
    expect(ENERGY_CAUTION).toMatch(/no legal determination/);
  });
});
