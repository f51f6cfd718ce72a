import { useState } from 'react';
import { StyleSheet, View, type LayoutChangeEvent } from 'react-native';

import { fittedCurve, type UsableMark } from '@/components/sight-ins/live-fit';
import { VictoryArea, VictoryAxis, VictoryChart, VictoryLine, VictoryScatter } from '@/components/sight-ins/victory';
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

const mm = (value: number) => `${value.toFixed(1)} mm`;
const signed = (value: number) => `${value >= 0 ? '+' : '−'}${Math.abs(value).toFixed(2)} mm`;

/**
 * The first chart in words (its text alternative): the marks, then the fitted
 * curve at its ends and every 20 between, and the band's width.
 * Example: fitChartWords(fit, 1, marks) → 'Reading against distance. Your marks: 20 yd at 14.9 mm, … The fitted curve: 10 yd 10.2 mm, 30 yd 18.4 mm, …'
 */
export function fitChartWords(fit: FitResult, sign: 1 | -1, marks: UsableMark[]): string {
  const unit = fit.distanceUnit;
  const predicted = fit.marks.filter((mark) => Number.isFinite(mark.markMm) && Number.isFinite(mark.sigmaMm));
  const shown = predicted.filter((mark, index) => index === 0 || index === predicted.length - 1 || mark.distance % 20 === 0);
  const bands = predicted.map((mark) => mark.sigmaMm);
  const markWords = marks.map((mark) => `${mark.distance} ${unit} at ${mm(mark.scaleMm)}`).join(', ');
  const curveWords = shown.map((mark) => `${mark.distance} ${unit} ${mm(sign * mark.markMm)}`).join(', ');
  const bandWords = bands.length
    ? ` Its one-sigma band is ±${Math.min(...bands).toFixed(2)} to ±${Math.max(...bands).toFixed(2)} mm wide.`
    : '';
  return `Reading against distance. Your marks: ${markWords || 'none'}. The fitted curve: ${curveWords}.${bandWords}`;
}

/** The residual chart in words: each mark's residual, and whether it lies within the band. */
export function residualChartWords(fit: FitResult, sign: 1 | -1): string {
  const unit = fit.distanceUnit;
  const words = fit.residuals.map(
    (residual) => `${residual.distance} ${unit} ${signed(sign * residual.residualMm)}${residual.outlier ? ' (an outlier)' : ''}`,
  );
  return `Each mark's distance from the fit: ${words.join(', ') || 'none'}.`;
}

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
        <View accessibilityLabel={`Chart: ${fitChartWords(fit, sign, marks)}`} role="img" testID="fit-chart-marks">
          {/* The label above is the chart's text alternative; victory's own svg is hidden from assistive technology. */}
          <View aria-hidden>
            <VictoryChart width={width} height={height} padding={padding} domainPadding={{ y: 4 }}>
              <VictoryAxis crossAxis={false} offsetY={padding.bottom} label={`Distance (${unit})`} style={axisStyle} />
              <VictoryAxis dependentAxis crossAxis={false} offsetX={padding.left} label="Reading (mm)" style={axisStyle} />
              <VictoryArea data={band} style={{ data: { fill: colors.signalTint, stroke: colors.signal, strokeWidth: 0.5 } }} />
              <VictoryLine data={curve} style={{ data: { stroke: colors.signal, strokeWidth: 2.5 } }} />
              <VictoryScatter data={points} size={6} style={{ data: { fill: colors.slate, stroke: colors.surface, strokeWidth: 2 } }} />
            </VictoryChart>
          </View>
        </View>
      ) : null}

      <Text variant="label" style={styles.second}>
        Residuals and band
      </Text>
      <Text variant="small" tone="soft">
        How far each mark sits off the fit, against the band the fit expects (±1 sigma, mm).
      </Text>
      {width > 0 ? (
        <View accessibilityLabel={`Chart: ${residualChartWords(fit, sign)}`} role="img" testID="fit-chart-residuals">
          <View aria-hidden>
            <VictoryChart
              width={width}
              height={Math.round(height * 0.7)}
              padding={padding}
              domain={{ x: [first, last], y: [-residualReach, residualReach] }}
            >
              <VictoryAxis crossAxis={false} offsetY={padding.bottom} label={`Distance (${unit})`} style={axisStyle} />
              <VictoryAxis
                dependentAxis
                crossAxis={false}
                offsetX={padding.left}
                label="mm"
                style={axisStyle}
                tickFormat={(tick: number) => tick.toFixed(2)}
              />
              <VictoryArea data={residualBand} style={{ data: { fill: colors.infoTint, stroke: colors.info, strokeWidth: 0.5 } }} />
              <VictoryLine
                data={[
                  { x: first, y: 0 },
                  { x: last, y: 0 },
                ]}
                style={{ data: { stroke: colors.inkSoft, strokeWidth: 1 } }}
              />
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
        </View>
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  box: { gap: space.xs, alignSelf: 'stretch' },
  second: { marginTop: space.lg },
});
