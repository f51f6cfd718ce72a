import { StyleSheet, View } from 'react-native';

import { Banner } from '@/components/ui/banner';
import { Text } from '@/components/ui/text';
import { borders, colors, radii, space } from '@/components/theme';
import { isFitInputError } from '@/math/fit/fit-input-error';
import type { SightModel } from '@/math/flight/sight-model';
import { pinPositions, type PinPosition } from '@/math/pins/pin-positions';
import { distanceToMetres, metresToDistance, type DistanceUnit } from '@/math/units/convert';

export interface PinGapsProps {
  model: SightModel;
  /** The bow's pin distances, in `pinUnit`. */
  pinDistances: readonly number[];
  pinUnit: DistanceUnit;
  /** +1, or −1 for a scale that grows upward. */
  sign: 1 | -1;
}

/**
 * For a sight with fixed pins: where each pin goes, from the math core's
 * pinPositions: its mark, its distance below the first pin and the gap to the
 * pin above, all in mm.
 * Example: `<PinGaps model={fit.model} pinDistances={[20, 30, 40]} pinUnit="yd" sign={1} />`
 */
export function PinGaps({ model, pinDistances, pinUnit, sign }: PinGapsProps) {
  let pins: PinPosition[] = [];
  let problem: string | null = null;
  try {
    const inModelUnit = pinDistances.map((distance) => metresToDistance(distanceToMetres(distance, pinUnit), model.distanceUnit));
    pins = pinPositions(model, inModelUnit).pins;
  } catch (error) {
    if (!isFitInputError(error)) throw error;
    problem = error.detail;
  }
  if (problem) return <Banner tone="warn" title="Pin gaps could not be worked out">{`${problem}.`}</Banner>;
  const shown = (distance: number) => Number(metresToDistance(distanceToMetres(distance, model.distanceUnit), pinUnit).toFixed(1));
  return (
    <View style={styles.table} role="table" aria-label="Pin positions and gaps" testID="pin-gaps">
      <View style={[styles.row, styles.head]} role="row">
        {['Pin', 'Mark', 'From first', 'Gap'].map((word) => (
          <Text key={word} variant="label" style={styles.cell} role="columnheader">
            {word}
          </Text>
        ))}
      </View>
      {pins.map((pin, index) => (
        <View key={pin.distance} role="row" style={[styles.row, index % 2 === 1 && styles.stripe]} testID={`pin-${shown(pin.distance)}`}>
          <Text variant="numeral" style={styles.cell} role="cell">
            {shown(pin.distance)} {pinUnit}
          </Text>
          <Text variant="numeral" style={styles.cell} role="cell">
            {(sign * pin.markMm).toFixed(2)} mm
          </Text>
          <Text variant="numeral" style={styles.cell} role="cell">
            {pin.fromFirstMm.toFixed(2)} mm
          </Text>
          <Text variant="numeral" style={styles.cell} role="cell">
            {pin.gapMm === null ? '—' : `${pin.gapMm.toFixed(2)} mm`}
          </Text>
        </View>
      ))}
    </View>
  );
}

const styles = StyleSheet.create({
  table: {
    borderRadius: radii.md,
    borderWidth: borders.hairline,
    borderColor: colors.line,
    overflow: 'hidden',
    backgroundColor: colors.surface,
  },
  row: { flexDirection: 'row', paddingHorizontal: space.md, paddingVertical: space.xs, gap: space.sm, minHeight: 40, alignItems: 'center' },
  head: { backgroundColor: colors.sunken },
  stripe: { backgroundColor: colors.paper },
  cell: { flex: 1, fontSize: 18, lineHeight: 22 },
});
