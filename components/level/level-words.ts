import type { LevelCheck, LevelPlace, LevelResult, LevelState } from '@/shared/level';

/** Button and list words for each step result. */
export const resultLabels: Record<LevelResult, string> = {
  pass: 'Pass',
  adjusted: 'Adjusted',
  fail: 'Fail',
  skipped: 'Skipped',
};

/** One line under each result button. */
export const resultHints: Record<LevelResult, string> = {
  pass: 'Level as found',
  adjusted: 'Was off; now level',
  fail: 'Off, and could not fix',
  skipped: 'Not checked this time',
};

export const placeLabels: Record<LevelPlace, string> = { bench: 'Bench', range: 'Range' };

/** The badge word per level state. */
export const levelStateLabels: Record<LevelState, string> = {
  verified: 'Level verified',
  due: 'Level check due',
  failed: 'Level failed',
  none: 'Never checked',
};

/**
 * "2 Dec 2026, 14:05" in the device's time zone, from an ISO timestamp.
 * Example: formatWhen('2026-12-02T14:05:00Z') → '2 Dec 2026, 14:05' (in UTC)
 */
export function formatWhen(iso: string): string {
  const date = new Date(iso);
  if (Number.isNaN(date.getTime())) return iso;
  return whenFormat.format(date);
}

/** "2 Dec 2026" in the device's time zone. */
export function formatDate(iso: string): string {
  const date = new Date(iso);
  if (Number.isNaN(date.getTime())) return iso;
  return dateFormat.format(date);
}

// Made once: toLocaleString builds a new Intl formatter on every call (a profile of the Bench's first render).
const whenFormat = new Intl.DateTimeFormat('en-GB', {
  day: 'numeric',
  month: 'short',
  year: 'numeric',
  hour: '2-digit',
  minute: '2-digit',
});
const dateFormat = new Intl.DateTimeFormat('en-GB', { day: 'numeric', month: 'short', year: 'numeric' });

/** Today's date as YYYY-MM-DD in the device's time zone (for the change form's default). */
export function todayIso(now = new Date()): string {
  const pad = (n: number) => String(n).padStart(2, '0');
  return `${now.getFullYear()}-${pad(now.getMonth() + 1)}-${pad(now.getDate())}`;
}

/** The number of steps that have a result. */
export function workedCount(check: LevelCheck): number {
  return check.steps.filter((step) => step.result !== null).length;
}

/** Index of the step to resume at: the first without a result (the last one when all have one). */
export function resumeIndex(check: LevelCheck): number {
  const index = check.steps.findIndex((step) => step.result === null);
  return index === -1 ? check.steps.length - 1 : index;
}

/** "4 pass · 1 skipped" for a check's results. */
export function resultSummary(check: LevelCheck): string {
  const counts = new Map<LevelResult, number>();
  for (const step of check.steps) if (step.result) counts.set(step.result, (counts.get(step.result) ?? 0) + 1);
  const order: LevelResult[] = ['pass', 'adjusted', 'fail', 'skipped'];
  const parts = order.filter((r) => counts.has(r)).map((r) => `${counts.get(r)} ${resultLabels[r].toLowerCase()}`);
  return parts.length ? parts.join(' · ') : 'No steps worked yet';
}
