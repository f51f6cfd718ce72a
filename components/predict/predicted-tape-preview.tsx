import { useMemo } from 'react';
import { StyleSheet, View } from 'react-native';
import { SvgXml } from 'react-native-svg';

import { Text } from '@/components/ui/text';
import { colors, radii, space } from '@/components/theme';
import type { SightModel } from '@/math/flight/sight-model';
import { predictedTapeSvg } from '@/math/card/predicted-tape-svg';

export interface PredictedTapePreviewProps {
  model: SightModel;
  from: number;
  to: number;
  widthMm: number;
  labels: { bow?: string; build?: string; speed?: string };
  /** Screen pixels per millimetre. */
  zoom?: number;
}

/**
 * The predicted tape on screen: the math core's own drawing (the same SVG the
 * server sends for download), enlarged by `zoom`.
 * Example: `<PredictedTapePreview model={model} from={20} to={80} widthMm={12} labels={{ build: 'Elk brass' }} />`
 */
export function PredictedTapePreview({ model, from, to, widthMm, labels, zoom = 5 }: PredictedTapePreviewProps) {
  const drawing = useMemo(() => {
    try {
      const xml = predictedTapeSvg(model, { from, to, widthMm, unit: model.distanceUnit }, labels);
      const size = /width="([\d.]+)mm" height="([\d.]+)mm"/.exec(xml);
      return { xml, widthMm: Number(size?.[1] ?? 60), heightMm: Number(size?.[2] ?? 60) };
    } catch {
      return null;
    }
  }, [model, from, to, widthMm, labels]);
  if (!drawing) return <Text tone="soft">The tape cannot be drawn for this range.</Text>;
  return (
    <View style={styles.box} testID="predicted-tape-preview">
      <View
        role="img"
        accessibilityLabel={`Predicted tape, ${from} to ${to} ${model.distanceUnit}, marked predicted, not sighted`}
        style={styles.paper}
      >
        <SvgXml xml={drawing.xml} width={drawing.widthMm * zoom} height={drawing.heightMm * zoom} />
      </View>
      <Text variant="caption" tone="soft" style={styles.caption}>
        Shown {zoom}× enlarged: {drawing.widthMm.toFixed(0)} × {drawing.heightMm.toFixed(0)} mm on paper.
      </Text>
    </View>
  );
}

const styles = StyleSheet.create({
  box: { alignItems: 'center', gap: space.sm, padding: space.lg, backgroundColor: colors.sunken, borderRadius: radii.md },
  paper: { backgroundColor: '#fff' },
  caption: { textAlign: 'center' },
});
