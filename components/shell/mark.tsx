import { Svg, Circle, Line } from '@/components/ui/svg-shapes';

import { colors } from '@/components/theme';

export interface MarkProps {
  /** Width and height in px. */
  size?: number;
  /** Colour of the ring and pin arm. */
  color?: string;
  /** Colour of the pin head. */
  accent?: string;
}

/**
 * Pinwright's mark: a sight pin's arm reaching into a peep ring, its head at the centre.
 * Example: `<Mark size={28} color={colors.onSlate} />`
 */
export function Mark({ size = 28, color = colors.ink, accent = colors.signalOnSlate }: MarkProps) {
  return (
    <Svg width={size} height={size} viewBox="0 0 32 32" aria-hidden>
      <Circle cx={17} cy={16} r={11.5} stroke={color} strokeWidth={3} fill="none" />
      <Line x1={1.5} y1={16} x2={13} y2={16} stroke={color} strokeWidth={3} strokeLinecap="round" />
      <Circle cx={17} cy={16} r={4} fill={accent} />
    </Svg>
  );
}
