import Svg, { Circle, Path } from 'react-native-svg';

import { CheckIcon, DashCircleIcon, ErrorIcon, type IconProps } from '@/components/ui/icons';
import { colors } from '@/components/theme';
import type { LevelResult } from '@/shared/level';

/** A circle with a turning arrow, for "adjusted". */
export function AdjustedIcon({ size = 24, color = colors.ink }: IconProps) {
  return (
    <Svg width={size} height={size} viewBox="0 0 24 24" aria-hidden>
      <Circle cx={12} cy={12} r={9} stroke={color} strokeWidth={2} fill="none" />
      <Path d="M8 13a4 4 0 1 0 1.3-4.2" stroke={color} strokeWidth={2} strokeLinecap="round" fill="none" />
      <Path d="M8.6 6.6L9.4 9.2 6.8 9.8" stroke={color} strokeWidth={2} strokeLinecap="round" strokeLinejoin="round" fill="none" />
    </Svg>
  );
}

/** The icon of each step result (each its own shape, so a result never relies on colour alone). */
export const resultIcons: Record<LevelResult, (props: IconProps) => React.ReactElement> = {
  pass: CheckIcon,
  adjusted: AdjustedIcon,
  fail: ErrorIcon,
  skipped: DashCircleIcon,
};

/** The colour of each step result. */
export const resultColors: Record<LevelResult, { text: string; ground: string }> = {
  pass: { text: colors.verified, ground: colors.verifiedTint },
  adjusted: { text: colors.info, ground: colors.infoTint },
  fail: { text: colors.failed, ground: colors.failedTint },
  skipped: { text: colors.none, ground: colors.noneTint },
};
