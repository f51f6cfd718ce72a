import { StyleSheet, View } from 'react-native';

import { Text } from '@/components/ui/text';
import { borders, colors, space } from '@/components/theme';

export interface KeyValueItem {
  label: string;
  value: string;
  /** Show the value in the numeral face (measurements). */
  numeric?: boolean;
}

/**
 * Label / value rows that wrap on a phone, e.g. a bow's set-up.
 * Example: `<KeyValueList items={[{ label: 'Sight radius', value: '840 mm', numeric: true }]} />`
 */
export function KeyValueList({ items, testID }: { items: readonly KeyValueItem[]; testID?: string }) {
  return (
    <View testID={testID}>
      {items.map((item, index) => (
        <View key={item.label} style={[styles.row, index < items.length - 1 && styles.rule]}>
          <Text variant="small" tone="soft" style={styles.label}>
            {item.label}
          </Text>
          <Text variant={item.numeric ? 'numeral' : 'body'} style={styles.value}>
            {item.value}
          </Text>
        </View>
      ))}
    </View>
  );
}

const styles = StyleSheet.create({
  row: { flexDirection: 'row', flexWrap: 'wrap', columnGap: space.md, paddingVertical: space.sm, alignItems: 'baseline' },
  rule: { borderBottomWidth: borders.hairline, borderBottomColor: colors.line },
  label: { width: 150 },
  value: { flexGrow: 1, flexShrink: 1, flexBasis: 160 },
});
