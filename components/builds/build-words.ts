import type { Build, BuildDerived } from '@/shared/build';

/**
 * A build's key numbers on one line: total grains, FOC, speed.
 * Example: buildLine({ totalGr: 452.4, focPct: 11.83, … }, 286) → '452 gr · FOC 11.8 % · 286 fps'
 */
export function buildLine(derived: Pick<BuildDerived, 'totalGr' | 'focPct'>, speedFps: number | null): string {
  const parts = [`${Math.round(derived.totalGr)} gr`];
  if (derived.focPct !== null) parts.push(`FOC ${derived.focPct.toFixed(1)} %`);
  if (speedFps !== null) parts.push(`${Math.round(speedFps)} fps`);
  return parts.join(' · ');
}

/** A build's name, or "Build #id" when it is not in the list (deleted or not loaded). */
export function buildName(builds: readonly Pick<Build, 'id' | 'name'>[], buildId: number): string {
  return builds.find((build) => build.id === buildId)?.name ?? `Build #${buildId}`;
}
