import { useState } from 'react';
import { Platform, ScrollView, StyleSheet, View, type LayoutChangeEvent, type TextStyle } from 'react-native';

import { buildStyle } from '@/components/compare/build-styles';
import { formatFixed, formatSigned } from '@/components/compare/format';
import { Text } from '@/components/ui/text';
import { colors, radii, space } from '@/components/theme';
import type { BuildComparison } from '@/shared/compare';

const distanceColumn = 56;
const buildColumn = 84;

/**
 * The distance column stays in view while the builds scroll sideways (CSS
 * position: sticky on the web; React Native's types know only absolute,
 * relative and static, so the value is widened through string). Held, it
 * reaches over the row's padding and the gap to the first build (padding
 * inside, negative margin outside) so that its ground hides what scrolls under.
 */
const stickyStart: TextStyle | null =
  Platform.OS === 'web'
    ? {
        position: 'sticky' as string as TextStyle['position'],
        left: 0,
        zIndex: 1,
        alignSelf: 'stretch',
        width: distanceColumn + space.sm,
        marginLeft: -space.sm,
        paddingLeft: space.sm,
        marginRight: -space.sm,
        paddingRight: space.sm,
      }
    : null;

/**
 * Marks by distance: each build's fitted mark, and for the others the
 * difference from the reference build (the first) in mm and in distance (how
 * far along the reference build's tape that mark sits, from the local slope
 * of its curve). Scrolls sideways on a narrow phone with four builds, the
 * distance column fixed at the left.
 * Example: `<CompareMarksTable comparison={data.comparison} />`
 */
export function CompareMarksTable({ comparison }: { comparison: BuildComparison }) {
  const unit = comparison.unit;
  // A horizontal scroll view leaves its content's width open, so text would never wrap: the table
  // takes the room it is given (or its minimum, then scrolls).
  const [roomWidth, setRoomWidth] = useState(0);
  const onLayout = (event: LayoutChangeEvent) => setRoomWidth(Math.floor(event.nativeEvent.layout.width));
  const minWidth = distanceColumn + buildColumn * comparison.builds.length;
  // Only a table wider than its room scrolls, and only then is the distance column held.
  const held = roomWidth > 0 && minWidth > roomWidth ? stickyStart : null;
  return (
    <View style={styles.box}>
      <ScrollView horizontal contentContainerStyle={styles.scroll} onLayout={onLayout}>
        <View
          // A held column needs the scroll view as its nearest clipping box, so the table does not clip then.
          style={[styles.table, { width: Math.max(minWidth, roomWidth) }, held && styles.unclipped]}
          role="table"
          aria-label="Marks by distance"
          testID="compare-marks"
        >
          <View style={[styles.row, styles.head]} role="row">
            <Text variant="label" style={[styles.distance, held, held && styles.headStart]} role="columnheader">
              {unit}
            </Text>
            {comparison.builds.map((build, index) => (
              <View key={build.label + index} style={styles.cell} role="columnheader">
                <View style={[styles.swatch, { backgroundColor: buildStyle(index).color }]} />
                <Text variant="label" numberOfLines={2}>
                  {build.label}
                </Text>
                <Text variant="caption" tone="soft">
                  {index === 0 ? 'reference, mm' : `mm, then Δ mm, Δ ${unit}`}
                </Text>
              </View>
            ))}
          </View>
          {comparison.rows.map((row, rowIndex) => (
            <View
              key={row.distance}
              style={[styles.row, rowIndex % 2 === 1 && styles.stripe]}
              role="row"
              testID={`compare-row-${row.distance}`}
            >
              <Text variant="numeral" style={[styles.distance, held, held && styles.bodyStart]} role="rowheader">
                {formatFixed(row.distance, 0)}
              </Text>
              {row.marks.map((mark, index) => (
                <View key={index} style={styles.cell} role="cell">
                  <Text variant="numeral">{formatFixed(mark.markMm, 1)}</Text>
                  {index > 0 ? (
                    <Text variant="caption" tone="soft" testID={`compare-diff-${row.distance}-${index}`}>
                      {`${formatSigned(mark.differenceMm, 1)} mm\n${mark.differenceDistance === null ? '—' : `${formatSigned(mark.differenceDistance, 1)} ${unit}`}`}
                    </Text>
                  ) : null}
                </View>
              ))}
            </View>
          ))}
        </View>
      </ScrollView>
      <Text variant="caption" tone="soft">
        Δ {unit}: how far out along the reference build’s tape the other build’s mark sits (+: it needs the reference’s mark for a longer
        shot). Near the turning point around 14 yd the curves are too flat to say.
      </Text>
    </View>
  );
}

const styles = StyleSheet.create({
  box: { gap: space.sm },
  scroll: { flexGrow: 1 },
  table: { flexGrow: 1, borderRadius: radii.md, overflow: 'hidden', borderWidth: 1, borderColor: colors.line },
  row: { flexDirection: 'row', alignItems: 'center', paddingVertical: space.xs, paddingHorizontal: space.sm, gap: space.sm },
  head: { backgroundColor: colors.sunken, alignItems: 'flex-end', paddingVertical: space.sm },
  stripe: { backgroundColor: colors.surface },
  distance: { width: distanceColumn - space.sm },
  // Opaque behind the sticky column, so the builds scroll under it.
  unclipped: { overflow: 'visible' },
  headStart: { backgroundColor: colors.sunken },
  bodyStart: { backgroundColor: colors.surface },
  cell: { flex: 1, minWidth: buildColumn - space.sm, gap: 0 },
  swatch: { width: 24, height: 4, borderRadius: 2 },
});
