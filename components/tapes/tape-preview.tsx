import { StyleSheet, View } from 'react-native';
import Svg, { G, Line, Path, Rect } from 'react-native-svg';

import { Text } from '@/components/ui/text';
import { colors, space } from '@/components/theme';
import { NUMERAL_FONT } from '@/math/tape/glyphs';
import { formatTapeNumber, type TapeLayout } from '@/math/tape/tape-layout';
import { textPath } from '@/math/tape/text-path';

export interface TapePreviewProps {
  /** The math core's layout: the same tick list the printed SVG is drawn from. */
  layout: TapeLayout;
  /** Screen pixels per millimetre of tape. */
  zoom?: number;
}

/**
 * The tape on screen, drawn with react-native-svg from the math core's
 * tapeLayout: the very ticks, offsets, lengths and numerals the printed SVG
 * carries (the viewBox is in mm, as on paper), only enlarged by `zoom`.
 * Example: `<TapePreview layout={tapeLayout(fit.model, { from: 20, to: 80 })} zoom={5} />`
 */
export function TapePreview({ layout, zoom = 5 }: TapePreviewProps) {
  const width = layout.widthMm;
  const across = (x: number) => (layout.mirror ? width - x : x);
  const anchor = layout.mirror ? 'end' : 'start';
  const numerals = layout.ticks
    .filter((tick) => tick.numeral)
    .map((tick) => ({
      distance: tick.distance,
      d: textPath(formatTapeNumber(tick.distance), NUMERAL_FONT, {
        x: across(layout.numeralXMm),
        y: tick.offsetMm,
        sizeMm: layout.numeralHeightMm,
        anchor,
        baseline: 'middle',
      }).d,
    }));
  const unitLabel = textPath(layout.unit, NUMERAL_FONT, {
    x: across(layout.numeralXMm),
    y: 0.4 + layout.numeralHeightMm / 2,
    sizeMm: layout.numeralHeightMm,
    anchor,
    baseline: 'middle',
  }).d;
  const first = layout.ticks[0];
  const last = layout.ticks[layout.ticks.length - 1];

  return (
    <View style={styles.box} testID="tape-preview">
      <Svg
        width={width * zoom}
        height={layout.lengthMm * zoom}
        viewBox={`0 0 ${width} ${layout.lengthMm}`}
        accessibilityLabel={`Tape preview, ${first?.distance ?? ''} to ${last?.distance ?? ''} ${layout.unit}, ${layout.ticks.length} ticks`}
      >
        <Rect x={0} y={0} width={width} height={layout.lengthMm} fill="#fff" stroke="#8a8a8a" strokeWidth={0.1} />
        <G stroke="#000" strokeLinecap="butt">
          {layout.ticks.map((tick) => (
            <Line
              key={tick.distance}
              x1={across(0)}
              y1={tick.offsetMm}
              x2={across(tick.lengthMm)}
              y2={tick.offsetMm}
              strokeWidth={tick.strokeMm}
            />
          ))}
        </G>
        <G fill="#000">
          {numerals.map((numeral) => (
            <Path key={numeral.distance} d={numeral.d} />
          ))}
          <Path d={unitLabel} />
        </G>
      </Svg>
      <Text variant="caption" tone="soft">
        Shown {zoom}× enlarged: {width.toFixed(1)} × {layout.lengthMm.toFixed(1)} mm on paper.
      </Text>
    </View>
  );
}

const styles = StyleSheet.create({
  box: { alignItems: 'center', gap: space.sm, padding: space.lg, backgroundColor: colors.sunken, borderRadius: 10 },
});
