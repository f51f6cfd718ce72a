import type { Readiness } from '@/components/ui/readiness-badge';
import type { BowReadiness } from '@/shared/bow';
import { calendarDayWords } from '@/shared/day-words';
import { levelSummarySchema, type LevelSummary } from '@/shared/level-summary';
import type { SightInFitSummary } from '@/shared/sight-in';

/** A readiness state with the short word a badge shows and one plain sentence. */
export interface ReadinessWords {
  state: Readiness;
  label: string;
  detail: string;
}

/**
 * Largest RMS of a fit's residuals (mm) still called a tight fit. A sight's
 * scale is read to about a quarter of a millimetre at the range (common
 * practice, no published source), so residuals near that are reading noise.
 */
export const tightFitRmsMm = 0.3;

/** "4 Oct 2026" from "2026-10-04" (the date as entered, no time zone shift), with the one shared formatter. */
export function formatDay(isoDate: string): string {
  return calendarDayWords(isoDate);
}

/**
 * How far a fit can be trusted, from its summary.
 * Example: fitWords({ rmsMm: 0.12, markCount: 4, longestDistance: 60, longestUnit: 'yd', … })
 *   → { state: 'verified', label: 'Tight fit', detail: '4 marks to 60 yd, RMS 0.12 mm.' }
 */
export function fitWords(
  summary: Pick<SightInFitSummary, 'rmsMm' | 'markCount' | 'longestDistance' | 'longestUnit'> & { warningCount?: number },
): ReadinessWords {
  const reach =
    summary.longestDistance !== null && summary.longestUnit ? ` to ${Math.round(summary.longestDistance)} ${summary.longestUnit}` : '';
  const marks = `${summary.markCount} ${summary.markCount === 1 ? 'mark' : 'marks'}${reach}`;
  if (summary.markCount < 2) return { state: 'failed', label: 'No fit', detail: `${marks}: two or more are needed.` };
  if (summary.rmsMm === null || summary.markCount === 2) {
    return { state: 'due', label: 'Two-mark fit', detail: `${marks}, fitted exactly; confirm the distances you will shoot.` };
  }
  if (summary.rmsMm > tightFitRmsMm || (summary.warningCount ?? 0) > 0) {
    return {
      state: 'due',
      label: 'Check the fit',
      detail: `${marks}, RMS ${summary.rmsMm.toFixed(2)} mm${summary.warningCount ? `, ${summary.warningCount} ${summary.warningCount === 1 ? 'warning' : 'warnings'}` : ''}.`,
    };
  }
  return { state: 'verified', label: 'Tight fit', detail: `${marks}, RMS ${summary.rmsMm.toFixed(2)} mm.` };
}

/** The sight-in part of a bow's readiness. */
export function sightInWords(readiness: BowReadiness): ReadinessWords {
  const latest = readiness.latestSightIn;
  if (!latest) return { state: 'none', label: 'Not sighted in', detail: 'No sight-in yet.' };
  // A change after it (and no tape to carry the message): shared/staleness.ts.
  if (readiness.confirm && readiness.confirm.tapeId === null)
    return { state: 'due', label: 'Confirm at the range', detail: readiness.confirm.reason };
  const words = fitWords(latest);
  return { ...words, detail: `Last sight-in ${formatDay(latest.date)}: ${words.detail}` };
}

/** The tape part of a bow's readiness. */
export function tapeWords(readiness: BowReadiness): ReadinessWords {
  // A change that moves the point of impact came after the tape's sight-in: shared/staleness.ts.
  if (readiness.confirm && readiness.confirm.tapeId !== null)
    return { state: 'due', label: 'Confirm at the range', detail: readiness.confirm.reason };
  if (readiness.hasTape) return { state: 'verified', label: 'Tape saved', detail: 'A tape layout is saved; confirm it at the range.' };
  if (readiness.latestSightIn) return { state: 'due', label: 'No tape yet', detail: 'Sighted in, but no tape layout saved.' };
  return { state: 'none', label: 'No tape', detail: 'A tape comes from a sight-in.' };
}

/** The level summary inside a bow's readiness, when the level feature reports one. */
export function levelOf(readiness: BowReadiness): LevelSummary | null {
  const parsed = levelSummarySchema.safeParse(readiness.level);
  return parsed.success ? parsed.data : null;
}

const levelLabels: Record<Readiness, string> = {
  verified: 'Level verified',
  due: 'Level check due',
  failed: 'Level failed',
  none: 'Level not checked',
};

/** The level part of a bow's readiness (null when the server sends none). */
export function levelWords(readiness: BowReadiness): ReadinessWords | null {
  const level = levelOf(readiness);
  if (!level) return null;
  return { state: level.state, label: levelLabels[level.state], detail: level.reason };
}
