import { useState } from 'react';
import { StyleSheet, View, type LayoutChangeEvent } from 'react-native';

import { fittedCurve, type UsableMark } from '@/components/sessions/live-fit';
import { VictoryArea, VictoryAxis, VictoryChart, VictoryLine, VictoryScatter } from '@/components/sessions/victory';
import { Text } from '@/components/ui/text';
import { colors, fonts, space } from '@/components/theme';
import type { FitResult } from '@/math/fit/fit-sight';

export interface FitChartProps {
  fit: FitResult;
  /** +1, or −1 for a scale that grows upward (readings shown as the archer reads them). */
  sign: 1 | -1;
  /** The sighted marks the fit used. */
  marks: UsableMark[];
}

const axisStyle = {
  axis: { stroke: colors.lineStrong },
  grid: { stroke: colors.line, strokeDasharray: '2,4' },
  tickLabels: { fontFamily: fonts.numeral, fontSize: 14, fill: colors.inkSoft, padding: 4 },
  axisLabel: { fontFamily: fonts.body, fontSize: 14, fill: colors.inkSoft, padding: 30 },
};

/**
 * Two charts of the live fit: the sighted marks on the fitted curve with its
 * one-sigma band, and the residuals (mark − fit) against the band around zero,
 * where a band a few tenths of a millimetre wide can actually be seen.
 * Example: `<FitChart fit={live.fit} sign={1} marks={live.marks} />`
 */
export function FitChart({ fit, sign, marks }: FitChartProps) {
  const [width, setWidth] = useState(0);
  const onLayout = (event: LayoutChangeEvent) => setWidth(Math.round(event.nativeEvent.layout.width));
  const unit = fit.distanceUnit;
  const predicted = fit.marks.filter((mark) => Number.isFinite(mark.markMm) && Number.isFinite(mark.sigmaMm));
  const first = predicted[0]?.distance ?? 10;
  const last = predicted[predicted.length - 1]?.distance ?? 100;
  const curve = fittedCurve(fit, sign, first, last, 1);
  const band = predicted.map((mark) => ({ x: mark.distance, y: sign * mark.markMm + mark.sigmaMm, y0: sign * mark.markMm - mark.sigmaMm }));
  const points = marks.map((mark) => ({ x: mark.distance, y: mark.scaleMm }));
  const residualBand = predicted.map((mark) => ({ x: mark.distance, y: mark.sigmaMm, y0: -mark.sigmaMm }));
  const residuals = fit.residuals.map((residual) => ({ x: residual.distance, y: sign * residual.residualMm, outlier: residual.outlier }));
  const residualReach = Math.max(0.3, ...residualBand.map((point) => point.y), ...residuals.map((point) => Math.abs(point.y))) * 1.2;
  const height = width < 500 ? 240 : 300;
  const padding = { top: 16, bottom: 48, left: 58, right: 16 };

  return (
    <View style={styles.box} onLayout={onLayout} testID="fit-chart">
      <Text variant="label">Marks and the fitted curve</Text>
      <Text variant="small" tone="soft">
        Dots: your marks. Line: the fit. Shading: its one-sigma band.
      </Text>
      {width > 0 ? (
        <View accessibilityLabel={`Chart of ${marks.length} marks and the fitted curve from ${first} to ${last} ${unit}`} role="img">
          <VictoryChart width={width} height={height} padding={padding} domainPadding={{ y: 4 }}>
            <VictoryAxis crossAxis={false} offsetY={padding.bottom} label={`Distance (${unit})`} style={axisStyle} />
            <VictoryAxis dependentAxis crossAxis={false} offsetX={padding.left} label="Reading (mm)" style={axisStyle} />
            <VictoryArea data={band} style={{ data: { fill: colors.signalTint, stroke: colors.signal, strokeWidth: 0.5 } }} />
            <VictoryLine data={curve} style={{ data: { stroke: colors.signal, strokeWidth: 2.5 } }} />
            <VictoryScatter data={points} size={6} style={{ data: { fill: colors.slate, stroke: colors.surface, strokeWidth: 2 } }} />
          </VictoryChart>
        </View>
      ) : null}

      <Text variant="label" style={styles.second}>
        Residuals and band
      </Text>
      <Text variant="small" tone="soft">
        How far each mark sits off the fit, against the band the fit expects (±1 sigma, mm).
      </Text>
      {width > 0 ? (
        <View accessibilityLabel="Chart of each mark's residual against the fit's band" role="img">
          <VictoryChart width={width} height={Math.round(height * 0.7)} padding={padding} domain={{ x: [first, last], y: [-residualReach, residualReach] }}>
            <VictoryAxis crossAxis={false} offsetY={padding.bottom} label={`Distance (${unit})`} style={axisStyle} />
            <VictoryAxis dependentAxis crossAxis={false} offsetX={padding.left} label="mm" style={axisStyle} tickFormat={(tick: number) => tick.toFixed(2)} />
            <VictoryArea data={residualBand} style={{ data: { fill: colors.infoTint, stroke: colors.info, strokeWidth: 0.5 } }} />
            <VictoryLine data={[{ x: first, y: 0 }, { x: last, y: 0 }]} style={{ data: { stroke: colors.inkSoft, strokeWidth: 1 } }} />
            <VictoryScatter
              data={residuals}
              size={6}
              style={{
                data: {
                  fill: ({ datum }: { datum?: { outlier?: boolean } }) => (datum?.outlier ? colors.failed : colors.slate),
                  stroke: colors.surface,
                  strokeWidth: 2,
                },
              }}
            />
          </VictoryChart>
        </View>
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  box: { gap: space.xs, alignSelf: 'stretch' },
  second: { marginTop: space.lg },
});
