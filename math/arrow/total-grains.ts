/**
 * Total arrow mass, grains: shaft (grains per inch × cut length) plus point,
 * insert, nock, vanes (count × weight), wrap and collar. Any part left out
 * counts as zero. (1 grain = 64.79891 mg exactly.)
 * Example: totalArrowGrains({ shaftGpi: 9.5, cutLengthIn: 28.5, pointGr: 100, insertGr: 16, nockGr: 9, vaneCount: 3, vaneGr: 6 }) → 413.75
 */
export interface ArrowComponents {
  /** Shaft weight, grains per inch. */
  shaftGpi: number;
  /** Cut length of the shaft, inches. */
  cutLengthIn: number;
  pointGr?: number;
  insertGr?: number;
  nockGr?: number;
  vaneCount?: number;
  /** Weight of one vane, grains. */
  vaneGr?: number;
  wrapGr?: number;
  collarGr?: number;
}

export function totalArrowGrains(parts: ArrowComponents): number {
  const values = [
    parts.shaftGpi,
    parts.cutLengthIn,
    parts.pointGr,
    parts.insertGr,
    parts.nockGr,
    parts.vaneCount,
    parts.vaneGr,
    parts.wrapGr,
    parts.collarGr,
  ];
  if (values.some((value) => value !== undefined && !(Number.isFinite(value) && value >= 0))) {
    throw new RangeError('totalArrowGrains: every weight, length and count must be a number of zero or more');
  }
  return (
    parts.shaftGpi * parts.cutLengthIn +
    (parts.pointGr ?? 0) +
    (parts.insertGr ?? 0) +
    (parts.nockGr ?? 0) +
    (parts.vaneCount ?? 0) * (parts.vaneGr ?? 0) +
    (parts.wrapGr ?? 0) +
    (parts.collarGr ?? 0)
  );
}
