import { StyleSheet, View } from 'react-native';

import type { LiveFit } from '@/components/sessions/live-fit';
import { Banner } from '@/components/ui/banner';
import { space } from '@/components/theme';

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

/**
 * The live fit's warnings in plain words, the ones to act on first: marks no
 * arrow can give (e.g. an impossible gap), an outlier, scattered marks or
 * measurements the marks disagree with; then the distances to confirm (band
 * too wide) and the distance to shoot next.
 * Example: fitAdvice(live)[0] → { tone: 'error', title: 'These marks cannot be fitted', message: 'The 60 yd mark is only 0.5 mm below …' }
 */
export function fitAdvice(live: LiveFit): FitAdvice[] {
  if (live.state === 'refused') return [{ tone: 'error', title: 'These marks cannot be fitted', message: `${live.message}.`.replace(/\.\.$/, '.'), key: 'refused' }];
  if (live.state !== 'fit') return [];
  const { fit, marks } = live;
  const unit = fit.distanceUnit;
  const sighted = (distance: number) => marks.some((mark) => Math.abs(mark.distance - distance) < 1e-9);
  const advice: FitAdvice[] = [];
  for (const warning of fit.warnings) {
    if (warning.code === 'verify' || warning.code === 'out-of-reach' || warning.code === 'slope-estimate') continue;
    const title =
      warning.code === 'outlier'
        ? 'A mark stands out'
        : warning.code === 'scatter'
          ? 'The marks scatter'
          : 'The marks disagree with a measurement';
    advice.push({ tone: 'warn', title, message: `${warning.message}.`, key: `${warning.code}-${warning.distance ?? ''}` });
  }
  const confirm = fit.marks.filter((mark) => mark.verify && Number.isFinite(mark.markMm) && !sighted(mark.distance)).map((mark) => mark.distance);
  if (confirm.length > 0) {
    advice.push({
      tone: 'warn',
      title: `Confirm at ${listDistances(confirm, unit)}`,
      message: `The predicted marks there are uncertain by more than a quarter of a millimetre. Shoot them before you trust the tape at those distances.`,
      key: 'verify',
    });
  }
  const unreachable = fit.marks.filter((mark) => !Number.isFinite(mark.markMm)).map((mark) => mark.distance);
  if (unreachable.length > 0) {
    advice.push({ tone: 'info', title: 'Out of reach', message: `With this fit the arrow cannot reach ${listDistances(unreachable, unit)}.`, key: 'reach' });
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
export function FitWarnings({ live }: { live: LiveFit }) {
  const advice = fitAdvice(live);
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

const styles = StyleSheet.create({
  list: { gap: space.sm },
});
