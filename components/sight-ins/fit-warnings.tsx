import { StyleSheet, View } from 'react-native';

import { useUnits } from '@/components/account/use-units';
import type { LiveFit } from '@/components/sight-ins/live-fit';
import { Banner } from '@/components/ui/banner';
import { Text } from '@/components/ui/text';
import { borders, colors, space } from '@/components/theme';
import type { MarkCheckResult, MarkProblemKind } from '@/shared/mark-checks';
import { formatQuantity } from '@/shared/units';

/** "80 yd", "80 and 90 yd", "70, 80 and 90 yd". */
export function listDistances(distances: readonly number[], unit: string): string {
  const words = distances.map((distance) => String(distance));
  const joined = words.length <= 1 ? words.join('') : `${words.slice(0, -1).join(', ')} and ${words[words.length - 1]}`;
  return `${joined} ${unit}`;
}

/** One line of advice from the live fit, with the tone it is shown in. */
export interface FitAdvice {
  tone: 'info' | 'warn' | 'error';
  title: string;
  message: string;
  key: string;
}

/** Warnings that blame a measurement of the bow or arrow: held back while a mark has a problem (the mark is the likelier cause). */
export const equipmentCodes: readonly string[] = ['chronograph', 'drag', 'sight-radius', 'peep-height'];

const problemWords: Record<MarkProblemKind, string> = {
  empty: 'not filled in',
  'not-a-number': 'not a number',
  'out-of-range': 'out of range',
  duplicate: 'distance entered twice',
  falling: 'reading falls with distance',
};

/**
 * The marks the live fit leaves out and why, as one sentence.
 * Example: leftOutWords(checks) → 'The fit leaves out mark 3 (reading falls with distance).'
 */
export function leftOutWords(checks: MarkCheckResult): string {
  const parts = checks.problems.map((problem) => `mark ${problem.mark} (${problemWords[problem.kind]})`);
  return `The fit leaves out ${parts.length <= 1 ? parts.join('') : `${parts.slice(0, -1).join(', ')} and ${parts[parts.length - 1]}`}.`;
}

/**
 * The live fit's warnings in plain words, the ones to act on first: marks
 * the fit leaves out (each named, from the live mark checks), marks no
 * arrow can give (e.g. an impossible gap), an outlier, scattered marks or
 * measurements the marks disagree with; then the distances to confirm (band
 * too wide) and the distance to shoot next. While a mark has a problem the
 * warnings that blame the equipment (chronograph, drag, sight radius, peep
 * height) are held back: a typo should not send the archer to re-measure.
 * Example: fitAdvice(live)[0] → { tone: 'error', title: 'These marks cannot be fitted', message: 'The 60 yd mark is only 0.5 mm below …' }
 */
export function fitAdvice(live: LiveFit, checks?: MarkCheckResult): FitAdvice[] {
  const problems = checks?.problems ?? [];
  const first: FitAdvice[] =
    checks && problems.length > 0
      ? [
          {
            tone: 'error',
            title:
              problems.length === 1
                ? `Check mark ${problems[0].mark}`
                : `Check marks ${problems.map((problem) => problem.mark).join(', ')}`,
            message: `${leftOutWords(checks)} Checks of the chronograph, drag and sight radius wait until the marks are fixed.`,
            key: 'left-out',
          },
        ]
      : [];
  if (live.state === 'refused')
    return [
      ...first,
      { tone: 'error', title: 'These marks cannot be fitted', message: `${live.message}.`.replace(/\.\.$/, '.'), key: 'refused' },
    ];
  if (live.state !== 'fit') return first;
  const { fit, marks } = live;
  const unit = fit.distanceUnit;
  const sighted = (distance: number) => marks.some((mark) => Math.abs(mark.distance - distance) < 1e-9);
  const advice: FitAdvice[] = [...first];
  for (const warning of fit.warnings) {
    if (warning.code === 'verify' || warning.code === 'out-of-reach' || warning.code === 'slope-estimate') continue;
    if (problems.length > 0 && equipmentCodes.includes(warning.code)) continue;
    const title =
      warning.code === 'one-mark'
        ? 'Only one distance sighted'
        : warning.code === 'outlier'
          ? 'A mark stands out'
          : warning.code === 'scatter'
            ? 'The marks scatter'
            : 'The marks disagree with a measurement';
    advice.push({ tone: 'warn', title, message: `${warning.message}.`, key: `${warning.code}-${warning.distance ?? ''}` });
  }
  const confirm = fit.marks
    .filter((mark) => mark.verify && Number.isFinite(mark.markMm) && !sighted(mark.distance))
    .map((mark) => mark.distance);
  // One mark: every other distance is to confirm, and the one-mark warning says so already.
  if (confirm.length > 0 && fit.method !== 'one-mark') {
    advice.push({
      tone: 'warn',
      title: `Confirm at ${listDistances(confirm, unit)}`,
      message: `The predicted marks there are uncertain by more than a quarter of a millimetre. Shoot them before you trust the tape at those distances.`,
      key: 'verify',
    });
  }
  const unreachable = fit.marks.filter((mark) => !Number.isFinite(mark.markMm)).map((mark) => mark.distance);
  if (unreachable.length > 0) {
    advice.push({
      tone: 'info',
      title: 'Out of reach',
      message: `With this fit the arrow cannot reach ${listDistances(unreachable, unit)}.`,
      key: 'reach',
    });
  }
  if (fit.nextDistance !== null) {
    advice.push({
      tone: 'info',
      title: `Shoot ${fit.nextDistance} ${unit} next`,
      message: `A mark at ${fit.nextDistance} ${unit} would shrink the uncertainty of the whole tape the most.`,
      key: 'next',
    });
  }
  return advice;
}

/**
 * The live fit's advice as banners (the refusal is an alert).
 * Example: `<FitWarnings live={live} />`
 */
export function FitWarnings({ live, checks }: { live: LiveFit; checks?: MarkCheckResult }) {
  const advice = fitAdvice(live, checks);
  if (advice.length === 0) return null;
  return (
    <View style={styles.list} testID="fit-warnings">
      {advice.map((item) => (
        <Banner key={item.key} tone={item.tone} title={item.title} testID={`fit-advice-${item.key}`}>
          {item.message}
        </Banner>
      ))}
    </View>
  );
}

/**
 * The live fit's key figures in one line that stays in view while marks are
 * typed on a phone (sticky at the top of the screen): speed, RMS, the
 * distance to shoot next, and the first thing to look at (a mark's problem
 * or the fit's first warning).
 * Example: `<FitStrip live={live} checks={checks} />`
 */
export function FitStrip({ live, checks }: { live: LiveFit; checks: MarkCheckResult }) {
  const units = useUnits();
  const problem = checks.problems[0];
  const advice = fitAdvice(live, checks).find((item) => item.tone !== 'info' && item.key !== 'left-out');
  const figures =
    live.state === 'fit'
      ? [
          formatQuantity(live.fit.speedFps, 'speed', units),
          live.fit.method === 'one-mark'
            ? 'estimate from 1 mark'
            : live.fit.method === 'two-mark'
              ? 'exact (2 marks)'
              : `RMS ${live.fit.rmsMm.toFixed(2)} mm`,
          live.fit.nextDistance !== null ? `next ${live.fit.nextDistance} ${live.fit.distanceUnit}` : null,
        ].filter(Boolean)
      : [];
  const line =
    live.state === 'fit'
      ? figures.join(' · ')
      : live.state === 'waiting'
        ? 'Live fit: waiting for two usable marks'
        : 'Live fit: these marks cannot be fitted';
  return (
    <View style={styles.strip} testID="fit-strip" role="status" aria-label="Live fit">
      <Text variant="label" testID="fit-strip-figures">
        {line}
      </Text>
      {problem ? (
        <Text variant="small" tone="failed" numberOfLines={2} testID="fit-strip-problem">
          {checks.problems.length > 1 ? `${problem.message} (+${checks.problems.length - 1} more)` : problem.message}
        </Text>
      ) : advice ? (
        <Text variant="small" tone="due" numberOfLines={2} testID="fit-strip-warning">
          {advice.title}
        </Text>
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  list: { gap: space.sm },
  strip: {
    // Web: stays at the top of the scrolling screen while the marks are typed.
    position: 'sticky' as never,
    top: 0,
    zIndex: 2,
    gap: space.xxs,
    paddingHorizontal: space.md,
    paddingVertical: space.sm,
    backgroundColor: colors.surface,
    borderWidth: borders.control,
    borderColor: colors.lineStrong,
    borderRadius: 10,
    boxShadow: '0 2px 6px rgba(30, 38, 46, 0.18)',
  },
});
