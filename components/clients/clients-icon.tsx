import { Svg, Circle, Path } from '@/components/ui/svg-shapes';

import type { IconProps } from '@/components/ui/icons';
import { colors } from '@/components/theme';

const stroke = { strokeWidth: 2, strokeLinecap: 'round', strokeLinejoin: 'round', fill: 'none' } as const;

/** Two people, one behind the other: a technician's clients. */
export function ClientsIcon({ size = 24, color = colors.ink }: IconProps) {
  return (
    <Svg width={size} height={size} viewBox="0 0 24 24" aria-hidden>
      <Circle cx={9} cy={8.5} r={3.5} stroke={color} {...stroke} />
      <Path d="M2.5 20c0-3.6 2.9-6 6.5-6s6.5 2.4 6.5 6" stroke={color} {...stroke} />
      <Path d="M15 5.2a3.5 3.5 0 010 6.6M17.5 14.4c2.4.7 4 2.7 4 5.6" stroke={color} {...stroke} />
    </Svg>
  );
}
