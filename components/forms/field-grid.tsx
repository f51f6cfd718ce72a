import { useState, type ReactNode } from 'react';
import { StyleSheet, View, type LayoutChangeEvent } from 'react-native';

import { space } from '@/components/theme';

/**
 * Form fields in columns of at least `minWidth` px: as many columns as fit
 * (never more than there are fields), one per line on a narrow phone. Every
 * field of a grid has the column's width, so a short last line does not
 * stretch its field across the card.
 * Example: `<FieldGrid><FormField …/><FormField …/></FieldGrid>`
 */
export function FieldGrid({ children, minWidth = 220 }: { children: ReactNode; minWidth?: number }) {
  const [width, setWidth] = useState(0);
  const items = (Array.isArray(children) ? children : [children]).filter(Boolean);
  const gap = space.lg;
  const columns = width > 0 ? Math.max(1, Math.min(items.length, Math.floor((width + gap) / (minWidth + gap)))) : 0;
  // Half a pixel spare, so rounding never pushes the last column onto a new line.
  const cellWidth = columns > 0 ? (width - gap * (columns - 1)) / columns - 0.5 : undefined;
  const onLayout = (event: LayoutChangeEvent) => setWidth(Math.floor(event.nativeEvent.layout.width));
  return (
    <View style={styles.grid} onLayout={onLayout}>
      {items.map((child, index) => (
        // Until the grid is measured, cells share the line by flex (one frame).
        <View key={index} style={cellWidth ? { width: cellWidth } : [styles.cell, { flexBasis: minWidth }]}>
          {child}
        </View>
      ))}
    </View>
  );
}

const styles = StyleSheet.create({
  grid: { flexDirection: 'row', flexWrap: 'wrap', columnGap: space.lg, rowGap: space.lg },
  cell: { flexGrow: 1, flexShrink: 1, minWidth: 0 },
});
