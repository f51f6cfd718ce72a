import { choleskySolve } from '@/math/numeric/symmetric-matrix';
import { markGradient } from '@/math/flight/mark-gradient';
import { markFromElevationMm, MODEL_PARAMETERS, shotParametersOf, type SightModel } from '@/math/flight/sight-model';
import { solveElevation } from '@/math/flight/solve-elevation';

/**
 * Maximum-a-posteriori fit of the sight model to level marks, by
 * Levenberg–Marquardt (K. Levenberg 1944; D. W. Marquardt, J. SIAM 11 (1963)
 * 431–441, with Marquardt's scaling by the diagonal of the normal matrix).
 *
 * Minimises  Φ(p) = Σ_i ((m_i − s_i(p))/σ_m)² + Σ_j ((p_j − μ_j)/σ_j)²
 * over p = (speedFps, scaleZeroMm, dragCoefficient, peepHeightMm, sightRadiusMm),
 * the order of MODEL_PARAMETERS; a parameter without a prior is free. The
 * Jacobian is the implicit-function one of markGradient (four flights a mark);
 * each trial step re-solves every mark from its last elevation (two or three
 * flights). The problem is nearly linear near the answer, so it converges in a
 * handful of steps.
 *
 * Example: mapFit({ rangesM: [18.288, 54.864], marksMm: [14.9, 32.6], ... }).parameters[0] → ≈ 285 (fps)
 */

/** A Gaussian prior on one parameter: mean and one sigma, in the parameter's unit. */
export interface Prior {
  mean: number;
  sigma: number;
}

/** The fit's data, priors and starting point. */
export interface MapProblem {
  rangesM: readonly number[];
  marksMm: readonly number[];
  markSigmaMm: number;
  /** The model's fixed part: everything but the five parameters. */
  base: Omit<SightModel, (typeof MODEL_PARAMETERS)[number] | 'covariance'>;
  /** A prior per parameter (MODEL_PARAMETERS order), or null for a free one. */
  priors: readonly (Prior | null)[];
  start: readonly number[];
  lower: readonly number[];
  upper: readonly number[];
}

/** The fit: parameters, fitted marks, elevations, the Jacobian at the answer (mm per parameter unit). */
export interface MapSolution {
  parameters: number[];
  fittedMm: number[];
  elevationsRad: number[];
  jacobian: number[][];
  objective: number;
  iterations: number;
}

/** The model for a parameter vector (MODEL_PARAMETERS order). Example: modelOf(base, [285, 0, 2, 110, 820]).speedFps → 285 */
export function modelOf(base: MapProblem['base'], parameters: readonly number[]): SightModel {
  return {
    ...base,
    speedFps: parameters[0],
    scaleZeroMm: parameters[1],
    dragCoefficient: parameters[2],
    peepHeightMm: parameters[3],
    sightRadiusMm: parameters[4],
  };
}

export function mapFit(problem: MapProblem): MapSolution {
  const count = MODEL_PARAMETERS.length;
  let parameters = [...problem.start];
  let guesses: (number | undefined)[] = problem.rangesM.map(() => undefined);

  const evaluate = (candidate: readonly number[]) => {
    const model = modelOf(problem.base, candidate);
    const shot = shotParametersOf(model);
    const elevations: number[] = [];
    const fitted: number[] = [];
    for (let i = 0; i < problem.rangesM.length; i++) {
      const solution = solveElevation(shot, problem.rangesM[i], 0, guesses[i]);
      if (!solution) return null;
      elevations.push(solution.elevationRad);
      fitted.push(markFromElevationMm(model, solution.elevationRad));
    }
    let objective = 0;
    for (let i = 0; i < fitted.length; i++) objective += ((problem.marksMm[i] - fitted[i]) / problem.markSigmaMm) ** 2;
    problem.priors.forEach((prior, j) => {
      if (prior) objective += ((candidate[j] - prior.mean) / prior.sigma) ** 2;
    });
    return { model, shot, elevations, fitted, objective };
  };

  let current = evaluate(parameters);
  if (!current) throw new RangeError('mapFit: the starting point does not reach every mark');
  let jacobian = jacobianAt(current);
  let lambda = 1e-4;
  let iterations = 0;

  for (; iterations < 40; iterations++) {
    // Normal equations A·δ = b with A = JᵀJ/σ² + P, b = Jᵀ(m − s)/σ² − P(p − μ).
    const a: number[][] = Array.from({ length: count }, () => new Array(count).fill(0));
    const b = new Array(count).fill(0);
    const weight = 1 / problem.markSigmaMm ** 2;
    for (let i = 0; i < jacobian.length; i++) {
      const row = jacobian[i];
      const residual = problem.marksMm[i] - current.fitted[i];
      for (let j = 0; j < count; j++) {
        b[j] += weight * row[j] * residual;
        for (let k = 0; k <= j; k++) a[j][k] += weight * row[j] * row[k];
      }
    }
    problem.priors.forEach((prior, j) => {
      if (!prior) return;
      a[j][j] += 1 / prior.sigma ** 2;
      b[j] -= (parameters[j] - prior.mean) / prior.sigma ** 2;
    });
    for (let j = 0; j < count; j++) for (let k = 0; k < j; k++) a[k][j] = a[j][k];

    let accepted = false;
    for (let attempt = 0; attempt < 12 && !accepted; attempt++) {
      const damped = a.map((row, j) => row.map((value, k) => (j === k ? value * (1 + lambda) : value)));
      const step = choleskySolve(damped, b);
      if (!step) {
        lambda *= 10;
        continue;
      }
      const candidate = parameters.map((value, j) => Math.min(problem.upper[j], Math.max(problem.lower[j], value + step[j])));
      guesses = current.elevations;
      const trial = evaluate(candidate);
      if (trial && trial.objective <= current.objective) {
        const decrease = current.objective - trial.objective;
        const moved = candidate.some((value, j) => Math.abs(value - parameters[j]) > 1e-10 * (1 + Math.abs(value)));
        parameters = candidate;
        current = trial;
        guesses = trial.elevations;
        jacobian = jacobianAt(current);
        lambda = Math.max(lambda / 10, 1e-9);
        accepted = true;
        if (!moved || decrease <= 1e-12 * (1 + current.objective)) return solution(iterations + 1);
      } else {
        lambda *= 10;
      }
    }
    if (!accepted) break;
  }
  return solution(iterations);

  function jacobianAt(state: NonNullable<ReturnType<typeof evaluate>>): number[][] {
    return problem.rangesM.map((rangeM, i) => markGradient(state.model, state.shot, rangeM, 0, state.elevations[i]).parameters);
  }

  function solution(done: number): MapSolution {
    const state = current!;
    return { parameters, fittedMm: state.fitted, elevationsRad: state.elevations, jacobian, objective: state.objective, iterations: done };
  }
}
