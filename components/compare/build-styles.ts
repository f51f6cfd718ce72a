import { colors } from '@/components/theme';

/**
 * How each compared build is drawn, by its place in the comparison: a colour
 * and a dash pattern, so the lines stay apart without relying on colour alone.
 * Example: buildStyle(1) → { color: '#2F5675', dash: '8,5', label: 'dashed' }
 */
const STYLES = [
  { color: colors.signal, dash: undefined, label: 'solid' },
  { color: colors.info, dash: '8,5', label: 'dashed' },
  { color: colors.verified, dash: '2,4', label: 'dotted' },
  { color: colors.due, dash: '12,4,3,4', label: 'dash-dot' },
] as const;

export function buildStyle(index: number): { color: string; dash: string | undefined; label: string } {
  return STYLES[index % STYLES.length];
}
