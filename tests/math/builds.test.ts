import { fitVirtualMass, predictBuildSpeedFps, FitInputError, grainsToKg, mpsToFps } from '@/math';
import { seededRandom } from './helpers';

// Synthetic bow for the virtual-mass model v = √(2E/(m + m_v)): E = 95 J, m_v = 300 gr (invented values).
const energyJ = 95;
const virtualMassGr = 300;
const speedOf = (massGr: number) => mpsToFps(Math.sqrt((2 * energyJ) / grainsToKg(massGr + virtualMassGr)));

describe('virtual-mass speed prediction', () => {
  it('recovers E and the virtual mass exactly from two builds and predicts a third within 1 fps', () => {
    const fit = fitVirtualMass([
      { massGr: 350, speedFps: speedOf(350) },
      { massGr: 460, speedFps: speedOf(460) },
    ]);
    expect(fit.energyJ).toBeCloseTo(energyJ, 8);
    expect(fit.virtualMassGr).toBeCloseTo(virtualMassGr, 6);
    expect(fit.rmsFps).toBeLessThan(1e-9);
    expect(Math.abs(predictBuildSpeedFps(fit, 540) - speedOf(540))).toBeLessThan(1);
    expect(predictBuildSpeedFps(fit, 540)).toBeCloseTo(speedOf(540), 8);
  });

  it('fits chronograph readings with ±1 fps of noise and still predicts a new build within 1 fps', () => {
    const random = seededRandom(7);
    const builds = [330, 380, 420, 470, 520].map((massGr) => ({ massGr, speedFps: speedOf(massGr) + (random() * 2 - 1) }));
    const fit = fitVirtualMass(builds);
    expect(fit.rmsFps).toBeLessThan(1);
    expect(Math.abs(predictBuildSpeedFps(fit, 445) - speedOf(445))).toBeLessThan(1);
  });

  it('refuses one build, equal masses and speeds that rise with mass', () => {
    expect(() => fitVirtualMass([{ massGr: 400, speedFps: 280 }])).toThrow(FitInputError);
    expect(() =>
      fitVirtualMass([
        { massGr: 400, speedFps: 280 },
        { massGr: 400, speedFps: 282 },
      ]),
    ).toThrow(/different arrow masses/);
    expect(() =>
      fitVirtualMass([
        { massGr: 350, speedFps: 280 },
        { massGr: 450, speedFps: 290 },
      ]),
    ).toThrow(/heavier builds must be slower/);
    try {
      fitVirtualMass([
        { massGr: 400, speedFps: 280 },
        { massGr: -1, speedFps: 260 },
      ]);
    } catch (error) {
      expect((error as FitInputError).field).toBe('builds[1].massGr');
    }
  });
});
