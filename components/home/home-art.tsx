import { Svg, Circle, Line, Path, Rect } from '@/components/ui/svg-shapes';

import { colors } from '@/components/theme';

/**
 * The empty home screen's picture: a workbench top with a vise and an empty bow hanger.
 * Example: `<HomeArt size={120} />`
 */
export function HomeArt({ size = 120 }: { size?: number }) {
  return (
    <Svg width={size} height={size * 0.66} viewBox="0 0 120 80" aria-hidden>
      <Rect x={8} y={44} width={104} height={8} rx={2} fill={colors.slate} />
      <Rect x={16} y={52} width={6} height={26} fill={colors.slate} />
      <Rect x={98} y={52} width={6} height={26} fill={colors.slate} />
      <Rect x={74} y={30} width={22} height={14} rx={2} fill={colors.inkSoft} />
      <Line x1={85} y1={30} x2={85} y2={22} stroke={colors.inkSoft} strokeWidth={4} strokeLinecap="round" />
      <Path d="M30 8v14M24 28l6-6 6 6" stroke={colors.lineStrong} strokeWidth={3} fill="none" strokeLinecap="round" />
      <Circle cx={50} cy={26} r={6} fill={colors.signal} />
    </Svg>
  );
}
