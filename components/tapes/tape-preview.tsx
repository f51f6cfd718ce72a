import { StyleSheet, View } from 'react-native';
import { SvgXml } from 'react-native-svg';

import { Text } from '@/components/ui/text';
import { colors, radii, space } from '@/components/theme';
import type { TapeLayout } from '@/math/tape/tape-layout';
import { tapeGroup } from '@/math/tape/tape-svg';

export interface TapePreviewProps {
  /** The math core's layout: the same tick list the printed SVG is drawn from. */
  layout: TapeLayout;
  /** Screen pixels per millimetre of tape. */
  zoom?: number;
}

/**
 * The tape on screen: the math core's own drawing of it (tapeGroup, the group
 * the downloaded SVG and the print sheet carry: ticks, offsets, numerals), in
 * a viewBox in mm, drawn by react-native-svg and only enlarged by `zoom`.
 * Example: `<TapePreview layout={tapeLayout(fit.model, { from: 20, to: 80 })} zoom={5} />`
 */
export function TapePreview({ layout, zoom = 8 }: TapePreviewProps) {
  const width = layout.widthMm;
  const xml = `<svg xmlns="http://www.w3.org/2000/svg" viewBox="0 0 ${width} ${layout.lengthMm}">${tapeGroup(layout)}</svg>`;
  const first = layout.ticks[0];
  const last = layout.ticks[layout.ticks.length - 1];
  return (
    <View style={styles.box} testID="tape-preview">
      <View
        role="img"
        accessibilityLabel={`Tape preview, ${first?.distance ?? ''} to ${last?.distance ?? ''} ${layout.unit}, ${layout.ticks.length} ticks`}
        style={styles.paper}
      >
        <SvgXml xml={xml} width={width * zoom} height={layout.lengthMm * zoom} />
      </View>
      <Text variant="caption" tone="soft" style={styles.caption}>
        Shown {zoom}× enlarged: {width.toFixed(1)} × {layout.lengthMm.toFixed(1)} mm on paper.
      </Text>
    </View>
  );
}

const styles = StyleSheet.create({
  box: { alignItems: 'center', gap: space.sm, padding: space.lg, backgroundColor: colors.sunken, borderRadius: radii.md },
  paper: { backgroundColor: '#fff' },
  caption: { textAlign: 'center' },
});
