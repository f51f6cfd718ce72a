import { useState } from 'react';
import { ScrollView, StyleSheet, View, type LayoutChangeEvent } from 'react-native';

import { formatFixed } from '@/components/compare/format';
import { Banner } from '@/components/ui/banner';
import { SectionHeading } from '@/components/ui/section-heading';
import { Text } from '@/components/ui/text';
import { colors, fonts, space } from '@/components/theme';
import { tableStyles } from '@/components/ui/table-styles';
import type { FieldCardData } from '@/shared/field-card';

const speedColumn = 56;
const distanceColumn = 50;

/**
 * The crosswind table on screen, as the printed card has it: one row per wind
 * speed (5, 10, 15 mph; 8, 16, 24 km/h for metres) at full value, from 3 or 9
 * o'clock, one column per distance on the level; each box the drift at the
 * target (in and cm) and the hold at the sight (mm sideways, into the wind).
 * Winds from 1, 5, 7 or 11 o'clock push half as much, from 2, 4, 8 or 10
 * about 0.87. With the caution that wind varies along the path.
 * Example: `<WindTable card={data.card} />`
 */
export function WindTable({ card }: { card: FieldCardData }) {
  const wind = card.wind;
  const [roomWidth, setRoomWidth] = useState(0);
  const onLayout = (event: LayoutChangeEvent) => setRoomWidth(Math.floor(event.nativeEvent.layout.width));
  const minWidth = speedColumn + distanceColumn * card.distances.length;
  return (
    <View style={styles.section} testID="field-card-wind">
      <SectionHeading
        title="Crosswind"
        level={2}
        description={`Wind from 3 or 9 o’clock, level shots, in the card’s air. Each box: the drift at the target (in, cm) and the hold at the sight (↔ mm): move the aim that far sideways at the pin, into the wind. From 1, 5, 7 or 11 o’clock: half of it; from 2, 4, 8 or 10: 0.87 of it.`}
      />
      <ScrollView horizontal contentContainerStyle={styles.scroll} onLayout={onLayout}>
        <View style={[styles.table, { width: Math.max(minWidth, roomWidth) }]} role="table" aria-label="Crosswind drift and hold">
          <View style={[styles.row, styles.head]} role="row">
            <Text variant="label" style={styles.speed} role="columnheader">
              wind
            </Text>
            {card.distances.map((distance) => (
              <Text key={distance} variant="label" style={[styles.cell, styles.centre]} role="columnheader">
                {distance} {card.unit}
              </Text>
            ))}
          </View>
          {wind.rows.map((row, rowIndex) => (
            <View key={row.speed} style={[styles.row, rowIndex % 2 === 1 && styles.stripe]} role="row">
              <View style={styles.speed} role="rowheader">
                <Text variant="numeral">{row.speed}</Text>
                <Text variant="caption" tone="soft">
                  {wind.speedUnit}
                </Text>
              </View>
              {row.cells.map((cell) => (
                <View key={cell.distance} style={styles.cell} role="cell" testID={`field-card-wind-${row.speed}-${cell.distance}`}>
                  {cell.driftIn === null || cell.driftCm === null ? (
                    <Text variant="caption" tone="soft">
                      out of reach
                    </Text>
                  ) : (
                    <>
                      <Text style={styles.drift}>{formatFixed(cell.driftIn, 1)} in</Text>
                      <Text style={styles.metric}>{formatFixed(cell.driftCm, cell.driftCm < 9.95 ? 1 : 0)} cm</Text>
                      <Text style={styles.hold} accessibilityLabel={`hold ${formatFixed(cell.holdMm, 1)} mm at the sight`}>
                        ↔ {formatFixed(cell.holdMm, 1)}
                      </Text>
                    </>
                  )}
                </View>
              ))}
            </View>
          ))}
        </View>
      </ScrollView>
      <Banner tone="caution" testID="field-card-wind-caution">
        {wind.caution}
      </Banner>
    </View>
  );
}

const styles = StyleSheet.create({
  section: { gap: space.md, marginTop: space.lg },
  ...tableStyles,
  speed: { width: speedColumn - space.xs },
  cell: { flex: 1, minWidth: distanceColumn - space.xs, alignItems: 'center' },
  centre: { textAlign: 'center' },
  drift: { fontFamily: fonts.numeralBold, fontSize: 17, lineHeight: 21, color: colors.ink },
  metric: { fontFamily: fonts.numeral, fontSize: 15, lineHeight: 19, color: colors.ink },
  hold: { fontFamily: fonts.numeral, fontSize: 15, lineHeight: 19, color: colors.inkSoft },
});
