import type { Build, BuildDerived } from '@/shared/build';
import { formatQuantity, type UnitsLike } from '@/shared/units';

/**
 * A build's key numbers on one line: total mass, FOC, speed, in the archer's units
 * (stored units, grains and fps, when none are given).
 * Example: buildLine({ totalGr: 452.4, focPct: 11.83, … }, 286) → '452 gr · FOC 11.8 % · 286 fps'
 */
export function buildLine(derived: Pick<BuildDerived, 'totalGr' | 'focPct'>, speedFps: number | null, units?: UnitsLike): string {
  const parts = [formatQuantity(derived.totalGr, 'mass', units)];
  if (derived.focPct !== null) parts.push(`FOC ${derived.focPct.toFixed(1)} %`);
  if (speedFps !== null) parts.push(formatQuantity(speedFps, 'speed', units));
  return parts.join(' · ');
}

/** A build's name, or "Build #id" when it is not in the list (deleted or not loaded). */
export function buildName(builds: readonly Pick<Build, 'id' | 'name'>[], buildId: number): string {
  return builds.find((build) => build.id === buildId)?.name ?? `Build #${buildId}`;
}
