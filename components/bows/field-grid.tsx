import type { ReactNode } from 'react';
import { StyleSheet, View } from 'react-native';

import { space } from '@/components/theme';

/**
 * Form fields side by side where they fit (each at least `minWidth` px), one
 * per line on a narrow phone. A short last line keeps the column width of the
 * lines above (zero-height spacer cells fill it, so a lone field does not
 * stretch across the whole card).
 * Example: `<FieldGrid><FormField …/><FormField …/></FieldGrid>`
 */
export function FieldGrid({ children, minWidth = 220 }: { children: ReactNode; minWidth?: number }) {
  const items = (Array.isArray(children) ? children : [children]).filter(Boolean);
  return (
    <View style={styles.grid}>
      {items.map((child, index) => (
        <View key={index} style={[styles.cell, { flexBasis: minWidth }]}>
          {child}
        </View>
      ))}
      {items.slice(1).map((_, index) => (
        <View key={`spacer-${index}`} style={[styles.spacer, { flexBasis: minWidth }]} aria-hidden />
      ))}
    </View>
  );
}

const styles = StyleSheet.create({
  // Gaps as margins (not rowGap), so a line of spacers adds no height.
  grid: { flexDirection: 'row', flexWrap: 'wrap', columnGap: space.lg, marginBottom: -space.lg },
  cell: { flexGrow: 1, flexShrink: 1, minWidth: 0, marginBottom: space.lg },
  spacer: { flexGrow: 1, flexShrink: 1, minWidth: 0, height: 0 },
});
