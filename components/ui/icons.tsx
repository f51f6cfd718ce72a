import { Svg, Circle, Line, Path, Rect } from '@/components/ui/svg-shapes';

import { colors } from '@/components/theme';

/** Props shared by every icon: size in px and stroke colour. Icons are decorative (hidden from screen readers). */
export interface IconProps {
  size?: number;
  color?: string;
}

const stroke = { strokeWidth: 2, strokeLinecap: 'round', strokeLinejoin: 'round', fill: 'none' } as const;

/** A workbench: top board on two legs with a vise block. */
export function BenchIcon({ size = 24, color = colors.ink }: IconProps) {
  return (
    <Svg width={size} height={size} viewBox="0 0 24 24" aria-hidden>
      <Rect x={2.5} y={8} width={19} height={3.5} rx={1} stroke={color} {...stroke} />
      <Line x1={5} y1={11.5} x2={5} y2={20.5} stroke={color} {...stroke} />
      <Line x1={19} y1={11.5} x2={19} y2={20.5} stroke={color} {...stroke} />
      <Line x1={5} y1={16.5} x2={19} y2={16.5} stroke={color} {...stroke} />
      <Rect x={14} y={4} width={5} height={4} rx={0.5} stroke={color} {...stroke} />
    </Svg>
  );
}

/** A person: head and shoulders. */
export function PersonIcon({ size = 24, color = colors.ink }: IconProps) {
  return (
    <Svg width={size} height={size} viewBox="0 0 24 24" aria-hidden>
      <Circle cx={12} cy={8} r={4} stroke={color} {...stroke} />
      <Path d="M4 20.5c0-4.2 3.6-7 8-7s8 2.8 8 7" stroke={color} {...stroke} />
    </Svg>
  );
}

/** A plus sign, for "add" actions. */
export function PlusIcon({ size = 24, color = colors.ink }: IconProps) {
  return (
    <Svg width={size} height={size} viewBox="0 0 24 24" aria-hidden>
      <Line x1={12} y1={5} x2={12} y2={19} stroke={color} {...stroke} />
      <Line x1={5} y1={12} x2={19} y2={12} stroke={color} {...stroke} />
    </Svg>
  );
}

/** A right chevron, for rows that open something. */
export function ChevronRightIcon({ size = 24, color = colors.ink }: IconProps) {
  return (
    <Svg width={size} height={size} viewBox="0 0 24 24" aria-hidden>
      <Path d="M9 5l7 7-7 7" stroke={color} {...stroke} />
    </Svg>
  );
}

/** A circled "i", for information. */
export function InfoIcon({ size = 24, color = colors.ink }: IconProps) {
  return (
    <Svg width={size} height={size} viewBox="0 0 24 24" aria-hidden>
      <Circle cx={12} cy={12} r={9} stroke={color} {...stroke} />
      <Line x1={12} y1={11} x2={12} y2={16.5} stroke={color} {...stroke} />
      <Circle cx={12} cy={7.6} r={1.2} fill={color} />
    </Svg>
  );
}

/** A triangle with "!", for warnings and cautions. */
export function WarningIcon({ size = 24, color = colors.ink }: IconProps) {
  return (
    <Svg width={size} height={size} viewBox="0 0 24 24" aria-hidden>
      <Path d="M12 3.5L21.5 20H2.5z" stroke={color} {...stroke} />
      <Line x1={12} y1={10} x2={12} y2={14} stroke={color} {...stroke} />
      <Circle cx={12} cy={17} r={1.2} fill={color} />
    </Svg>
  );
}

/** A circled cross, for errors and failures. */
export function ErrorIcon({ size = 24, color = colors.ink }: IconProps) {
  return (
    <Svg width={size} height={size} viewBox="0 0 24 24" aria-hidden>
      <Circle cx={12} cy={12} r={9} stroke={color} {...stroke} />
      <Line x1={9} y1={9} x2={15} y2={15} stroke={color} {...stroke} />
      <Line x1={15} y1={9} x2={9} y2={15} stroke={color} {...stroke} />
    </Svg>
  );
}

/** A circled tick, for verified states. */
export function CheckIcon({ size = 24, color = colors.ink }: IconProps) {
  return (
    <Svg width={size} height={size} viewBox="0 0 24 24" aria-hidden>
      <Circle cx={12} cy={12} r={9} stroke={color} {...stroke} />
      <Path d="M8 12.5l2.8 2.8L16.2 9.5" stroke={color} {...stroke} />
    </Svg>
  );
}

/** A clock face, for "due" states. */
export function ClockIcon({ size = 24, color = colors.ink }: IconProps) {
  return (
    <Svg width={size} height={size} viewBox="0 0 24 24" aria-hidden>
      <Circle cx={12} cy={12} r={9} stroke={color} {...stroke} />
      <Path d="M12 7v5l3.5 2" stroke={color} {...stroke} />
    </Svg>
  );
}

/** A dashed circle, for "not checked yet". */
export function DashCircleIcon({ size = 24, color = colors.ink }: IconProps) {
  return (
    <Svg width={size} height={size} viewBox="0 0 24 24" aria-hidden>
      <Circle cx={12} cy={12} r={9} stroke={color} strokeDasharray="3 3" {...stroke} />
      <Line x1={8.5} y1={12} x2={15.5} y2={12} stroke={color} {...stroke} />
    </Svg>
  );
}

/** A door with an arrow leaving, for signing out. */
export function SignOutIcon({ size = 24, color = colors.ink }: IconProps) {
  return (
    <Svg width={size} height={size} viewBox="0 0 24 24" aria-hidden>
      <Path d="M14 4H6.5A1.5 1.5 0 0 0 5 5.5v13A1.5 1.5 0 0 0 6.5 20H14" stroke={color} {...stroke} />
      <Line x1={10} y1={12} x2={20} y2={12} stroke={color} {...stroke} />
      <Path d="M16.5 8.5L20 12l-3.5 3.5" stroke={color} {...stroke} />
    </Svg>
  );
}
