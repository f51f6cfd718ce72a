import type { ReactNode } from 'react';
import { StyleSheet, View } from 'react-native';

import { space } from '@/components/theme';

/**
 * Form fields side by side where they fit (each at least `minWidth` px), one
 * per line on a phone.
 * Example: `<FieldGrid><FormField …/><FormField …/></FieldGrid>`
 */
export function FieldGrid({ children, minWidth = 220 }: { children: ReactNode; minWidth?: number }) {
  const items = Array.isArray(children) ? children : [children];
  return (
    <View style={styles.grid}>
      {items.map((child, index) =>
        child ? (
          <View key={index} style={[styles.cell, { flexBasis: minWidth }]}>
            {child}
          </View>
        ) : null,
      )}
    </View>
  );
}

const styles = StyleSheet.create({
  grid: { flexDirection: 'row', flexWrap: 'wrap', columnGap: space.lg, rowGap: space.lg },
  cell: { flexGrow: 1, flexShrink: 1, minWidth: 0 },
});
