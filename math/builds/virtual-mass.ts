import { GRAIN_KG } from '@/math/units/constants';
import { fpsToMps, grainsToKg, mpsToFps } from '@/math/units/convert';
import { FitInputError } from '@/math/fit/fit-input-error';

/**
 * The virtual-mass model of a bow: the energy E it gives to the arrow and to a
 * "virtual mass" m_v of limbs and string moving with it, so an arrow of mass m
 * leaves at v = √(2E/(m + m_v)). (From memory: P. E. Klopsteg, "Physics of bows
 * and arrows", Am. J. Phys. 11 (1943) 175–192; B. W. Kooi's papers on bow and
 * arrow mechanics. Citation to be verified before quoting.)
 *
 * Fit: 1/v² = m/(2E) + m_v/(2E) is linear in m. It is solved by least squares
 * weighted by v⁶/4, which makes each residual the speed residual to first order
 * (δ(1/v²) = −2·δv/v³); two builds give E and m_v exactly.
 *
 * Units: masses grains, speeds ft/s, energy joules.
 * Example: fitVirtualMass([{ massGr: 350, speedFps: 300 }, { massGr: 450, speedFps: 270 }]) → { energyJ: 115.49, virtualMassGr: 76.3, rmsFps: 0 }
 */
export interface ChronographedBuild {
  massGr: number;
  speedFps: number;
}

export interface VirtualMassFit {
  /** Energy shared by arrow and virtual mass, J. */
  energyJ: number;
  /** Virtual mass of the moving limbs and string, grains. */
  virtualMassGr: number;
  /** RMS of the speed residuals, ft/s (0 for two builds). */
  rmsFps: number;
}

export function fitVirtualMass(builds: readonly ChronographedBuild[]): VirtualMassFit {
  if (builds.length < 2) throw new FitInputError('builds', 'Enter at least two chronographed builds');
  builds.forEach((build, index) => {
    if (!(build.massGr > 0 && Number.isFinite(build.massGr)))
      throw new FitInputError(`builds[${index}].massGr`, 'Enter the arrow mass in grains');
    if (!(build.speedFps > 0 && Number.isFinite(build.speedFps)))
      throw new FitInputError(`builds[${index}].speedFps`, 'Enter the chronographed speed in fps');
  });
  const masses = builds.map((build) => grainsToKg(build.massGr));
  const inverseSquares = builds.map((build) => 1 / fpsToMps(build.speedFps) ** 2);
  const weights = builds.map((build) => fpsToMps(build.speedFps) ** 6 / 4);
  // Weighted normal equations for y = a·m + b.
  let sw = 0,
    swm = 0,
    swmm = 0,
    swy = 0,
    swmy = 0;
  builds.forEach((_, i) => {
    sw += weights[i];
    swm += weights[i] * masses[i];
    swmm += weights[i] * masses[i] * masses[i];
    swy += weights[i] * inverseSquares[i];
    swmy += weights[i] * masses[i] * inverseSquares[i];
  });
  const determinant = sw * swmm - swm * swm;
  // Numeric care: masses within a fraction of a grain give a singular system.
  if (!(determinant > 1e-12 * sw * swmm)) throw new FitInputError('builds', 'The builds need different arrow masses');
  const slope = (sw * swmy - swm * swy) / determinant;
  const intercept = (swy - slope * swm) / sw;
  if (!(slope > 0)) throw new FitInputError('builds', 'The heavier builds must be slower; check the speeds');
  const energyJ = 1 / (2 * slope);
  const virtualMassKg = intercept / slope;
  if (!(virtualMassKg > -Math.min(...masses))) throw new FitInputError('builds', 'These speeds fit no bow; check them');
  const fit: VirtualMassFit = { energyJ, virtualMassGr: virtualMassKg / GRAIN_KG, rmsFps: 0 };
  const residuals = builds.map((build) => build.speedFps - predictBuildSpeedFps(fit, build.massGr));
  fit.rmsFps = Math.sqrt(residuals.reduce((sum, r) => sum + r * r, 0) / residuals.length);
  return fit;
}

/**
 * Speed (ft/s) of a new build of `massGr` grains from a virtual-mass fit.
 * Example: predictBuildSpeedFps({ energyJ: 115.49, virtualMassGr: 76.3, rmsFps: 0 }, 400) → 283.8
 */
export function predictBuildSpeedFps(fit: Pick<VirtualMassFit, 'energyJ' | 'virtualMassGr'>, massGr: number): number {
  return mpsToFps(Math.sqrt((2 * fit.energyJ) / grainsToKg(massGr + fit.virtualMassGr)));
}
