import { useState } from 'react';
import { StyleSheet, View, type LayoutChangeEvent } from 'react-native';
import Svg, { Line } from 'react-native-svg';

import { buildStyle } from '@/components/compare/build-styles';
import { VictoryAxis, VictoryChart, VictoryLine } from '@/components/sight-ins/victory';
import { Text } from '@/components/ui/text';
import { colors, fonts, space } from '@/components/theme';
import type { BuildComparison } from '@/shared/compare';

const axisStyle = {
  axis: { stroke: colors.lineStrong },
  grid: { stroke: colors.line, strokeDasharray: '2,4' },
  tickLabels: { fontFamily: fonts.numeral, fontSize: 14, fill: colors.inkSoft, padding: 4 },
  axisLabel: { fontFamily: fonts.body, fontSize: 14, fill: colors.inkSoft, padding: 30 },
};

/**
 * The chart in words (its text alternative): each build's fitted mark at the
 * ends of the range and every 20 between.
 * Example: compareChartWords(comparison) → 'Fitted marks by distance. Elk heavy: 20 yd 14.9 mm, 40 yd 22.7 mm, … Practice light: …'
 */
export function compareChartWords(comparison: BuildComparison): string {
  const unit = comparison.unit;
  const parts = comparison.curves.map((curve) => {
    const points = curve.points.filter((point) => point.markMm !== null);
    const shown = points.filter((point, index) => index === 0 || index === points.length - 1 || point.distance % 20 === 0);
    return `${curve.label}: ${shown.map((point) => `${point.distance} ${unit} ${(point.markMm as number).toFixed(1)} mm`).join(', ') || 'no reachable marks'}`;
  });
  return `Fitted marks by distance. ${parts.join('. ')}.`;
}

/**
 * The fitted mark curves of the compared builds on one chart (victory, as the
 * sight-in chart), each in its own colour and dash, with a legend that shows
 * the same line samples.
 * Example: `<CompareChart comparison={data.comparison} />`
 */
export function CompareChart({ comparison }: { comparison: BuildComparison }) {
  const [width, setWidth] = useState(0);
  const onLayout = (event: LayoutChangeEvent) => setWidth(Math.round(event.nativeEvent.layout.width));
  const unit = comparison.unit;
  const curves = comparison.curves.map((curve) => ({
    label: curve.label,
    data: curve.points.filter((point) => point.markMm !== null).map((point) => ({ x: point.distance, y: point.markMm as number })),
  }));
  const first = comparison.curves[0]?.points[0]?.distance ?? 10;
  const last = comparison.curves[0]?.points[comparison.curves[0].points.length - 1]?.distance ?? 100;
  const height = width < 500 ? 260 : 320;
  return (
    <View style={styles.box} onLayout={onLayout} testID="compare-chart">
      <Text variant="small" tone="soft">
        Each build’s fitted marks from {first} to {last} {unit}: the higher a line, the lower the pin sits for that distance.
      </Text>
      {width > 0 ? (
        <View role="img" accessibilityLabel={`Chart: ${compareChartWords(comparison)}`} testID="compare-chart-img">
          {/* The label above is the chart's text alternative; victory's own svg is hidden from assistive technology. */}
          <View aria-hidden>
            <VictoryChart width={width} height={height} padding={{ top: 16, bottom: 48, left: 58, right: 16 }} domainPadding={{ y: 4 }}>
              <VictoryAxis crossAxis={false} label={`Distance (${unit})`} style={axisStyle} />
              <VictoryAxis dependentAxis crossAxis={false} label="Reading (mm)" style={axisStyle} />
              {curves.map((curve, index) => (
                <VictoryLine
                  key={curve.label + index}
                  data={curve.data}
                  style={{ data: { stroke: buildStyle(index).color, strokeWidth: 2.5, strokeDasharray: buildStyle(index).dash } }}
                />
              ))}
            </VictoryChart>
          </View>
        </View>
      ) : null}
      <View style={styles.legend}>
        {curves.map((curve, index) => (
          <View key={curve.label + index} style={styles.legendItem}>
            <Svg width={36} height={12}>
              <Line
                x1={2}
                y1={6}
                x2={34}
                y2={6}
                stroke={buildStyle(index).color}
                strokeWidth={3}
                strokeDasharray={buildStyle(index).dash}
              />
            </Svg>
            <Text variant="small">
              {index + 1}. {curve.label}
              {index === 0 ? ' (reference)' : ''}
            </Text>
          </View>
        ))}
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  box: { gap: space.sm, alignSelf: 'stretch' },
  legend: { flexDirection: 'row', flexWrap: 'wrap', gap: space.lg },
  legendItem: { flexDirection: 'row', alignItems: 'center', gap: space.sm },
});
