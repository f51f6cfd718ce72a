import { useState } from 'react';
import { ScrollView, StyleSheet, View, type LayoutChangeEvent } from 'react-native';

import { formatFixed, formatSigned } from '@/components/compare/format';
import { Text } from '@/components/ui/text';
import { colors, fonts, space } from '@/components/theme';
import { tableStyles } from '@/components/ui/table-styles';
import type { FieldCardData } from '@/shared/field-card';

const angleColumn = 56;
const distanceColumn = 54;

/** "−30° down", "0° level", "+20° up". */
export function angleWords(angleDeg: number): { angle: string; way: string } {
  if (angleDeg === 0) return { angle: '0°', way: 'level' };
  return { angle: `${angleDeg > 0 ? '+' : '−'}${Math.abs(angleDeg)}°`, way: angleDeg > 0 ? 'uphill' : 'downhill' };
}

/**
 * The slope table on screen, as the printed card has it: one row per
 * line-of-sight angle, one column per slant distance; each box the mark to
 * hold (mm), ≈ the distance to set on the sight-in tape, and the rifleman's
 * rule S·cos θ with the set distance minus it.
 * Example: `<SlopeTable card={data.card} />`
 */
export function SlopeTable({ card }: { card: FieldCardData }) {
  const unit = card.unit;
  // A horizontal scroll view leaves its content's width open, so text would never wrap: the table
  // takes the room it is given (or its minimum, then scrolls).
  const [roomWidth, setRoomWidth] = useState(0);
  const onLayout = (event: LayoutChangeEvent) => setRoomWidth(Math.floor(event.nativeEvent.layout.width));
  const minWidth = angleColumn + distanceColumn * card.distances.length;
  return (
    // Focusable with a name, so a keyboard can scroll it (WCAG 2.1.1; axe "scrollable-region-focusable").
    <ScrollView
      horizontal
      contentContainerStyle={styles.scroll}
      onLayout={onLayout}
      tabIndex={0}
      aria-label="Marks for slopes (scrolls sideways)"
    >
      <View
        style={[styles.table, { width: Math.max(minWidth, roomWidth) }]}
        role="table"
        aria-label="Marks for slopes"
        testID="field-card-table"
      >
        <View style={[styles.row, styles.head]} role="row">
          <Text variant="label" style={styles.angle} role="columnheader">
            slope
          </Text>
          {card.distances.map((distance) => (
            <Text key={distance} variant="label" style={[styles.cell, styles.centre]} role="columnheader">
              {distance} {unit}
            </Text>
          ))}
        </View>
        {card.anglesDeg.map((angleDeg, rowIndex) => {
          const words = angleWords(angleDeg);
          return (
            <View key={angleDeg} style={[styles.row, rowIndex % 2 === 1 && styles.stripe]} role="row">
              <View style={styles.angle} role="rowheader">
                <Text variant="numeral">{words.angle}</Text>
                <Text variant="caption" tone="soft">
                  {words.way}
                </Text>
              </View>
              {card.distances.map((distance) => {
                const cell = card.rows.find((row) => row.angleDeg === angleDeg && row.distance === distance);
                return (
                  <View key={distance} style={styles.cell} role="cell" testID={`field-card-cell-${angleDeg}-${distance}`}>
                    {!cell || cell.markMm === null ? (
                      <Text variant="caption" tone="soft">
                        out of reach
                      </Text>
                    ) : (
                      <>
                        <Text variant="numeral" style={styles.mark}>
                          {formatFixed(cell.markMm, 1)}
                        </Text>
                        <Text style={styles.aim}>≈ {cell.aimAsIf === null ? 'none' : formatFixed(cell.aimAsIf, 1)}</Text>
                        <Text style={styles.rule}>
                          {formatFixed(cell.horizontal, 1)}{' '}
                          {cell.aimAsIfMinusHorizontal === null ? '' : formatSigned(cell.aimAsIfMinusHorizontal, 1)}
                        </Text>
                      </>
                    )}
                  </View>
                );
              })}
            </View>
          );
        })}
      </View>
    </ScrollView>
  );
}

const styles = StyleSheet.create({
  ...tableStyles,
  angle: { width: angleColumn - space.xs },
  cell: { flex: 1, minWidth: distanceColumn - space.xs, alignItems: 'center', gap: 0 },
  centre: { textAlign: 'center' },
  mark: { fontFamily: fonts.numeralBold },
  aim: { fontFamily: fonts.numeral, fontSize: 16, lineHeight: 20, color: colors.ink },
  rule: { fontFamily: fonts.numeral, fontSize: 14, lineHeight: 18, color: colors.inkSoft },
});
