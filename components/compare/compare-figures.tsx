import { useState } from 'react';
import { ScrollView, StyleSheet, View, type LayoutChangeEvent } from 'react-native';

import { useUnits } from '@/components/account/use-units';
import { buildStyle } from '@/components/compare/build-styles';
import { formatFixed } from '@/components/compare/format';
import { Text } from '@/components/ui/text';
import { colors, radii, space } from '@/components/theme';
import type { BuildComparison, ComparedBuild } from '@/shared/compare';
import { formatQuantity } from '@/shared/units';

const labelColumn = 116;
const buildColumn = 96;

/**
 * Speed, total grains, FOC, kinetic energy, momentum, drop between two
 * distances and range forgiveness, one column per build.
 * Example: `<CompareFigures comparison={data.comparison} chronographed={[276, null]} />`
 */
export function CompareFigures({ comparison, chronographed }: { comparison: BuildComparison; chronographed: (number | null)[] }) {
  const unit = comparison.unit;
  // Speed and mass in the archer's units (fps or m/s, gr or g).
  const units = useUnits();
  const speed = (fps: number) => formatQuantity(fps, 'speed', units);
  const rows: { label: string; hint?: string; value: (build: ComparedBuild, index: number) => string }[] = [
    {
      label: 'Speed',
      hint: 'fitted (chronograph)',
      value: (build, index) => {
        const measured = chronographed[index];
        return `${speed(build.speedFps)}${measured !== null ? ` (${speed(measured)})` : ''}`;
      },
    },
    { label: 'Total weight', value: (build) => formatQuantity(build.massGr, 'mass', units) },
    { label: 'FOC', value: (build) => (build.focPct === null ? 'not measured' : `${formatFixed(build.focPct, 1)} %`) },
    {
      label: 'Kinetic energy',
      value: (build) => `${formatFixed(build.kineticEnergyFtLbf, 1)} ft·lbf\n${formatFixed(build.kineticEnergyJ, 1)} J`,
    },
    {
      label: 'Momentum',
      value: (build) => `${formatFixed(build.momentumSlugFps, 3)} slug·ft/s\n${formatFixed(build.momentumKgMps, 2)} kg·m/s`,
    },
    {
      label: `Drop ${comparison.near}–${comparison.far} ${unit}`,
      hint: `held for ${comparison.near}, below the line of sight at ${comparison.far}`,
      value: (build) => (build.drop ? `${formatFixed(build.drop.dropMm, 0)} mm` : 'out of reach'),
    },
    {
      label: `Forgiveness at ${comparison.at} ${unit}`,
      hint: `range within ±${comparison.windowMm} mm`,
      value: (build) =>
        build.forgiveness
          ? `${formatFixed(build.forgiveness.span, 1)} ${unit}\n${formatFixed(build.forgiveness.nearEdge, 1)}–${formatFixed(build.forgiveness.farEdge, 1)}`
          : 'out of reach',
    },
  ];
  // A horizontal scroll view leaves its content's width open, so text would never wrap: the table
  // takes the room it is given (or its minimum, then scrolls).
  const [roomWidth, setRoomWidth] = useState(0);
  const onLayout = (event: LayoutChangeEvent) => setRoomWidth(Math.floor(event.nativeEvent.layout.width));
  const minWidth = labelColumn + buildColumn * comparison.builds.length;
  return (
    <ScrollView horizontal contentContainerStyle={styles.scroll} onLayout={onLayout}>
      <View
        style={[styles.table, { width: Math.max(minWidth, roomWidth) }]}
        role="table"
        aria-label="The builds side by side"
        testID="compare-figures"
      >
        <View style={[styles.row, styles.head]} role="row">
          <View style={styles.label} />
          {comparison.builds.map((build, index) => (
            <View key={build.label + index} style={styles.cell} role="columnheader">
              <View style={[styles.swatch, { backgroundColor: buildStyle(index).color }]} />
              <Text variant="label" numberOfLines={2}>
                {build.label}
              </Text>
            </View>
          ))}
        </View>
        {rows.map((row, rowIndex) => (
          <View key={row.label} style={[styles.row, rowIndex % 2 === 1 && styles.stripe]} role="row">
            <View style={styles.label} role="rowheader">
              <Text variant="label">{row.label}</Text>
              {row.hint ? (
                <Text variant="caption" tone="soft">
                  {row.hint}
                </Text>
              ) : null}
            </View>
            {comparison.builds.map((build, index) => (
              <Text key={index} variant="body" style={styles.cell} role="cell">
                {row.value(build, index)}
              </Text>
            ))}
          </View>
        ))}
      </View>
    </ScrollView>
  );
}

const styles = StyleSheet.create({
  scroll: { flexGrow: 1 },
  table: { flexGrow: 1, borderRadius: radii.md, overflow: 'hidden', borderWidth: 1, borderColor: colors.line },
  row: { flexDirection: 'row', alignItems: 'flex-start', paddingVertical: space.sm, paddingHorizontal: space.sm, gap: space.sm },
  head: { backgroundColor: colors.sunken, alignItems: 'flex-end' },
  stripe: { backgroundColor: colors.surface },
  label: { width: labelColumn - space.sm, gap: 0 },
  cell: { flex: 1, minWidth: buildColumn - space.sm, gap: space.xxs },
  swatch: { width: 24, height: 4, borderRadius: 2 },
});
