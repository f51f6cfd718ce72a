import { useFieldArray, useFormState, type Control } from 'react-hook-form';
import { StyleSheet, View } from 'react-native';

import { emptyMarkRow, type SessionFormText } from '@/components/sessions/session-form-values';
import { Button } from '@/components/ui/button';
import { FormField } from '@/components/ui/form-field';
import { PlusIcon } from '@/components/ui/icons';
import { Text } from '@/components/ui/text';
import { borders, colors, radii, space } from '@/components/theme';
import { maxMarks, type SessionInput } from '@/shared/session';

/** How a table row sits against the live fit (readings as the archer reads them). */
export interface RowFit {
  fittedMm: number;
  residualMm: number;
  outlier: boolean;
}

export interface MarkTableProps {
  control: Control<SessionFormText, unknown, SessionInput>;
  unit: SessionFormText['unit'];
  /** The live fit per table row (absent for rows the fit does not use). */
  rowFits: Record<number, RowFit>;
  /** A table row the fit refused (e.g. a distance entered twice). */
  refusedRow?: number | null;
  /** The first rows that are shown but cannot change or be removed (a technician's view of saved marks). Default 0. */
  lockedRows?: number;
}

/**
 * The marks table: one card per sighted distance (distance, reading in mm,
 * arrows shot, note) with big inputs, add and remove. Beside each row, how far
 * it sits off the live fit. Blank rows are ignored on save. The first
 * `lockedRows` rows are read-only.
 * Example: `<MarkTable control={control} unit="yd" rowFits={{ 0: { fittedMm: 12.4, residualMm: 0, outlier: false } }} />`
 */
export function MarkTable({ control, unit, rowFits, refusedRow = null, lockedRows = 0 }: MarkTableProps) {
  const { fields, append, remove } = useFieldArray({ control, name: 'marks' });
  const { errors } = useFormState({ control, name: 'marks' });
  const listError = errors.marks?.root?.message ?? errors.marks?.message;

  return (
    <View style={styles.table} testID="mark-table">
      {fields.map((field, index) => {
        const fit = rowFits[index];
        const locked = index < lockedRows;
        return (
          <View
            key={field.id}
            style={[styles.row, fit?.outlier && styles.rowOutlier, refusedRow === index && styles.rowRefused]}
            testID={`mark-row-${index}`}
            role="group"
            aria-label={`Mark ${index + 1}`}
          >
            <View style={styles.rowHead}>
              <Text variant="label">Mark {index + 1}</Text>
              {fit ? (
                <Text
                  variant="small"
                  tone={fit.outlier ? 'failed' : 'soft'}
                  testID={`mark-residual-${index}`}
                >
                  {fit.outlier ? 'Outlier: ' : ''}
                  {Math.abs(fit.residualMm) < 0.005 ? 'on the fit' : `${fit.residualMm > 0 ? '+' : '−'}${Math.abs(fit.residualMm).toFixed(2)} mm off the fit`}
                </Text>
              ) : null}
              <View style={styles.spacer} />
              {locked ? (
                <Text variant="small" tone="soft" testID={`mark-locked-${index}`}>
                  Saved
                </Text>
              ) : (
                <Button
                  label="Remove"
                  variant="quiet"
                  onPress={() => remove(index)}
                  accessibilityLabel={`Remove mark ${index + 1}`}
                  testID={`mark-remove-${index}`}
                />
              )}
            </View>
            <View style={styles.inputs}>
              <View style={styles.numberCell}>
                <FormField control={control} name={`marks.${index}.distance`} label="Distance" unit={unit} numeric disabled={locked} testID={`mark-distance-${index}`} />
              </View>
              <View style={styles.numberCell}>
                <FormField control={control} name={`marks.${index}.scaleMm`} label="Reading" unit="mm" numeric disabled={locked} testID={`mark-reading-${index}`} />
              </View>
              <View style={styles.smallCell}>
                <FormField control={control} name={`marks.${index}.arrowsShot`} label="Arrows" numeric inputMode="numeric" disabled={locked} testID={`mark-arrows-${index}`} />
              </View>
              <View style={styles.noteCell}>
                <FormField control={control} name={`marks.${index}.note`} label="Note" placeholder="Optional" disabled={locked} testID={`mark-note-${index}`} />
              </View>
            </View>
          </View>
        );
      })}
      {listError ? (
        <Text variant="small" tone="failed" role="alert">
          {listError}
        </Text>
      ) : null}
      <Button
        label="Add a mark"
        icon={PlusIcon}
        variant="secondary"
        onPress={() => append({ ...emptyMarkRow })}
        disabled={fields.length >= maxMarks}
        testID="mark-add"
      />
    </View>
  );
}

const styles = StyleSheet.create({
  table: { gap: space.md },
  row: {
    gap: space.sm,
    padding: space.md,
    borderRadius: radii.md,
    backgroundColor: colors.surface,
    borderWidth: borders.hairline,
    borderColor: colors.line,
  },
  rowOutlier: { borderColor: colors.failed, borderWidth: borders.focus, backgroundColor: colors.failedTint },
  rowRefused: { borderColor: colors.due, borderWidth: borders.focus },
  rowHead: { flexDirection: 'row', alignItems: 'center', flexWrap: 'wrap', columnGap: space.md },
  spacer: { flexGrow: 1 },
  inputs: { flexDirection: 'row', flexWrap: 'wrap', columnGap: space.md, rowGap: space.sm },
  numberCell: { flexGrow: 1, flexBasis: 96, minWidth: 0 },
  smallCell: { flexGrow: 0, flexBasis: 72, minWidth: 0 },
  noteCell: { flexGrow: 2, flexBasis: 200, minWidth: 0 },
});
