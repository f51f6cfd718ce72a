import { colors, radii, space } from '@/components/theme';

/**
 * The frame every figures table shares (field card slope and wind tables,
 * compare tables): a horizontal scroll that fills the card, a rounded ruled
 * box, rows with a sunken head and striped bodies. Spread into a screen's own
 * StyleSheet.create, beside its column widths.
 * Example: `const styles = StyleSheet.create({ ...tableStyles, cell: { flex: 1 } });`
 */
export const tableStyles = {
  scroll: { flexGrow: 1 },
  table: { flexGrow: 1, borderRadius: radii.md, overflow: 'hidden', borderWidth: 1, borderColor: colors.line },
  row: { flexDirection: 'row', alignItems: 'center', paddingVertical: space.xs, paddingHorizontal: space.xs, gap: space.xs },
  head: { backgroundColor: colors.sunken, paddingVertical: space.sm },
  stripe: { backgroundColor: colors.surface },
} as const;
