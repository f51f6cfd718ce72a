import { Svg, Path, Rect } from '@/components/ui/svg-shapes';

import type { IconProps } from '@/components/ui/icons';
import { colors } from '@/components/theme';

const stroke = { strokeWidth: 2, strokeLinecap: 'round', strokeLinejoin: 'round', fill: 'none' } as const;

/** A key card with lines: running the service. */
export function AdminIcon({ size = 24, color = colors.ink }: IconProps) {
  return (
    <Svg width={size} height={size} viewBox="0 0 24 24" aria-hidden>
      <Rect x={3} y={4.5} width={18} height={15} rx={2} stroke={color} {...stroke} />
      <Path d="M7 9.5h5M7 13h10M7 16.5h7" stroke={color} {...stroke} />
      <Path d="M16 9.5h1" stroke={color} {...stroke} />
    </Svg>
  );
}
