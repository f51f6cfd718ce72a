import { StyleSheet, View } from 'react-native';

import type { UsableMark } from '@/components/sight-ins/live-fit';
import { Text } from '@/components/ui/text';
import { borders, colors, radii, space } from '@/components/theme';
import type { FitResult } from '@/math/fit/fit-sight';

export interface PredictedMarksProps {
  fit: FitResult;
  sign: 1 | -1;
  marks: UsableMark[];
}

/**
 * The predicted mark for every distance of the range (shared/sight-in-fit.ts
 * predictDistances: every 5 from 10 to 100 in either unit, further past a long
 * mark, and the bow's fixed pins) with its ± band in mm and in distance, as the
 * saved fit will have it; a distance sighted today is marked
 * "sighted", one whose band is too wide "confirm".
 * Example: `<PredictedMarks fit={fit} sign={1} marks={marks} />`
 */
export function PredictedMarks({ fit, sign, marks }: PredictedMarksProps) {
  const unit = fit.distanceUnit;
  const sighted = (distance: number) => marks.some((mark) => Math.abs(mark.distance - distance) < 1e-9);
  return (
    <View style={styles.table} role="table" aria-label="Predicted marks" testID="predicted-marks">
      <View style={[styles.row, styles.head]} role="row">
        <Text variant="label" style={styles.distance} role="columnheader">
          Distance
        </Text>
        <Text variant="label" style={styles.mark} role="columnheader">
          Mark, mm
        </Text>
        <Text variant="label" style={styles.band} role="columnheader">
          Band, mm
        </Text>
        <Text variant="label" style={styles.status} role="columnheader">
          Status
        </Text>
      </View>
      {fit.marks.map((mark, index) => {
        const reachable = Number.isFinite(mark.markMm);
        const isSighted = sighted(mark.distance);
        const status = !reachable ? 'Out of reach' : isSighted ? 'Sighted' : mark.verify ? 'Confirm' : 'Predicted';
        return (
          <View
            key={mark.distance}
            role="row"
            style={[styles.row, index % 2 === 1 && styles.stripe, mark.verify && reachable && !isSighted && styles.verify]}
            testID={`predicted-${mark.distance}`}
          >
            <Text variant="numeral" style={[styles.cell, styles.distance]} role="cell">
              {mark.distance} {unit}
            </Text>
            <Text variant="numeral" style={[styles.cell, styles.mark]} role="cell">
              {reachable ? (sign * mark.markMm).toFixed(2) : '—'}
            </Text>
            <View style={styles.band} role="cell">
              <Text variant="numeral" tone="soft" style={styles.cell}>
                {reachable && Number.isFinite(mark.sigmaMm) ? `±${mark.sigmaMm.toFixed(2)}` : '—'}
              </Text>
              {reachable && mark.sigmaDistance !== null ? (
                <Text variant="caption" tone="soft">
                  ±{mark.sigmaDistance.toFixed(1)} {unit}
                </Text>
              ) : null}
            </View>
            <Text
              variant="small"
              tone={status === 'Confirm' ? 'due' : status === 'Sighted' ? 'verified' : 'soft'}
              style={styles.status}
              role="cell"
            >
              {status}
            </Text>
          </View>
        );
      })}
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
  // Fits a 390 px phone (about 320 px inside its card): the middle columns give way, Status keeps its words.
  row: { flexDirection: 'row', alignItems: 'center', paddingHorizontal: space.sm, paddingVertical: space.xs, gap: space.xs, minHeight: 40 },
  head: { backgroundColor: colors.sunken, borderBottomWidth: borders.hairline, borderBottomColor: colors.line },
  stripe: { backgroundColor: colors.paper },
  verify: { backgroundColor: colors.dueTint },
  cell: { fontSize: 18, lineHeight: 22 },
  distance: { flexBasis: 56, flexGrow: 0, flexShrink: 0 },
  mark: { flexBasis: 64, flexGrow: 1, flexShrink: 1, minWidth: 0 },
  band: { flexBasis: 72, flexGrow: 1, flexShrink: 1, minWidth: 0 },
  status: { flexBasis: 78, flexGrow: 0, flexShrink: 0, textAlign: 'right' },
});
