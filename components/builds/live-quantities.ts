import { buildTextToInput, type BuildFormText } from '@/components/builds/build-form-values';
import { focPercent, kineticEnergy, momentum, totalArrowGrains } from '@/math/arrow';
import { mmToInches } from '@/math/units/convert';
import type { FormUnits } from '@/components/forms/form-numbers';

/** What the build form shows as the archer types; null where an input is missing or out of range. */
export interface LiveQuantities {
  totalGr: number | null;
  focPct: number | null;
  kineticEnergyJ: number | null;
  kineticEnergyFtLb: number | null;
  momentumKgMPerS: number | null;
  momentumSlugFtPerS: number | null;
  /** What to enter next for the missing figures, in plain words. */
  needs: string[];
}

const usable = (value: number | null | undefined): value is number => typeof value === 'number' && Number.isFinite(value) && value >= 0;

/**
 * Total grains, FOC, kinetic energy and momentum from the form's text, by the
 * math core (the same functions the server stores with the build). Parts left
 * empty count as zero; a figure whose inputs are missing is null.
 * Example: liveQuantities({ …, grainsPerInch: '9.5', cutLengthMm: '28.5', pointGr: '100', … }, 'in').totalGr → 413.75
 */
export function liveQuantities(text: BuildFormText, unit: FormUnits): LiveQuantities {
  const input = buildTextToInput(text, unit);
  const needs: string[] = [];
  const weight = (value: number | undefined) => (usable(value) ? value : 0);

  let totalGr: number | null = null;
  if (usable(input.grainsPerInch) && usable(input.cutLengthMm) && input.cutLengthMm > 0) {
    totalGr = totalArrowGrains({
      shaftGpi: input.grainsPerInch,
      cutLengthIn: mmToInches(input.cutLengthMm),
      pointGr: weight(input.pointGr),
      insertGr: weight(input.insertGr),
      nockGr: weight(input.nockGr),
      vaneCount: weight(input.vaneCount),
      vaneGr: weight(input.vaneWeightGr),
      wrapGr: weight(input.wrapGr),
      collarGr: weight(input.collarGr),
    });
  } else {
    needs.push('grains per inch and cut length for the total');
  }

  let focPct: number | null = null;
  if (usable(input.balancePointMm) && usable(input.cutLengthMm) && input.cutLengthMm > 0 && input.balancePointMm <= input.cutLengthMm) {
    focPct = focPercent({ balancePoint: input.balancePointMm, arrowLength: input.cutLengthMm });
  } else {
    needs.push('the balance point for FOC');
  }

  let energy: ReturnType<typeof kineticEnergy> | null = null;
  let push: ReturnType<typeof momentum> | null = null;
  if (totalGr !== null && totalGr > 0 && usable(input.speedFps)) {
    energy = kineticEnergy({ massGr: totalGr, speedFps: input.speedFps });
    push = momentum({ massGr: totalGr, speedFps: input.speedFps });
  } else {
    needs.push('a chronographed speed for energy and momentum');
  }

  return {
    totalGr,
    focPct,
    kineticEnergyJ: energy?.joules ?? null,
    kineticEnergyFtLb: energy?.footPounds ?? null,
    momentumKgMPerS: push?.kilogramMetresPerSecond ?? null,
    momentumSlugFtPerS: push?.slugFeetPerSecond ?? null,
    needs,
  };
}
