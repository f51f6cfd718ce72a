import { useState } from 'react';
import { Controller, useFieldArray, useFormState, type Control, type FieldPath } from 'react-hook-form';
import { Pressable, StyleSheet, TextInput, useWindowDimensions, View } from 'react-native';

import { emptyMarkRow, type SightInFormText } from '@/components/sight-ins/sight-in-form-values';
import { Button } from '@/components/ui/button';
import { FormField } from '@/components/ui/form-field';
import { PlusIcon } from '@/components/ui/icons';
import { Text } from '@/components/ui/text';
import { borders, colors, layout, radii, space, type } from '@/components/theme';
import type { MarkProblem } from '@/shared/mark-checks';
import { maxMarks, type SightInInput } from '@/shared/sight-in';

/** How a table row sits against the live fit (readings as the archer reads them). */
export interface RowFit {
  fittedMm: number;
  residualMm: number;
  outlier: boolean;
}

export interface MarkTableProps {
  control: Control<SightInFormText, unknown, SightInInput>;
  unit: SightInFormText['unit'];
  /** The live fit per table row (absent for rows the fit does not use). */
  rowFits: Record<number, RowFit>;
  /** A table row the fit refused (e.g. a distance entered twice). */
  refusedRow?: number | null;
  /** The first rows that are shown but cannot change or be removed (a technician's view of saved marks). Default 0. */
  lockedRows?: number;
  /** Each row's live problem (shared/mark-checks), by table row. */
  problems?: Record<number, MarkProblem>;
}

/** Window width (px) below which each mark is one compact row (a phone held in one hand). */
export const compactBelow = 600;

/** "on the fit", "Outlier: +0.42 mm off the fit". */
function residualWords(fit: RowFit): string {
  const off =
    Math.abs(fit.residualMm) < 0.005
      ? 'on the fit'
      : `${fit.residualMm > 0 ? '+' : '−'}${Math.abs(fit.residualMm).toFixed(2)} mm off the fit`;
  return `${fit.outlier ? 'Outlier: ' : ''}${off}`;
}

type Control_ = MarkTableProps['control'];

/**
 * One number cell of a compact row: no visible label (the column heads say
 * it), its accessible name says which mark; 48 px tall, numeric keypad.
 */
function CompactNumber({
  control,
  name,
  label,
  unit,
  whole = false,
  disabled,
  invalid,
  testID,
}: {
  control: Control_;
  name: FieldPath<SightInFormText>;
  label: string;
  unit?: string;
  whole?: boolean;
  disabled: boolean;
  invalid: boolean;
  testID: string;
}) {
  const [focused, setFocused] = useState(false);
  return (
    <Controller
      control={control}
      name={name}
      render={({ field, fieldState }) => (
        <View
          style={[
            styles.cellBox,
            focused && styles.cellFocused,
            (invalid || fieldState.error) && styles.cellInvalid,
            disabled && styles.cellDisabled,
          ]}
        >
          <TextInput
            ref={field.ref}
            value={field.value === null || field.value === undefined ? '' : String(field.value)}
            onChangeText={field.onChange}
            onBlur={() => {
              setFocused(false);
              field.onBlur();
            }}
            onFocus={() => setFocused(true)}
            aria-label={label}
            aria-invalid={invalid || fieldState.error ? true : undefined}
            editable={!disabled}
            inputMode={whole ? 'numeric' : 'decimal'}
            keyboardType={whole ? 'number-pad' : 'decimal-pad'}
            enterKeyHint="next"
            testID={testID}
            style={styles.cellInput}
          />
          {unit ? (
            <Text variant="small" tone="soft" style={styles.cellUnit}>
              {unit}
            </Text>
          ) : null}
        </View>
      )}
    />
  );
}

/**
 * The marks table: for each sighted distance the distance, the reading in mm,
 * arrows shot and a note, with add and remove. On a phone (narrower than
 * `compactBelow`) each mark is one compact row of three number cells with
 * the numeric keypad and 48 px targets, the note and Remove folded behind a
 * tap; wider, a card per mark with labelled fields. Under each row, its live
 * problem (shared/mark-checks: not a number, out of range, entered twice, a
 * falling reading), else how far it sits off the live fit. Blank rows are
 * ignored on save. The first `lockedRows` rows are read-only.
 * Example: `<MarkTable control={control} unit="yd" rowFits={{ 0: { fittedMm: 12.4, residualMm: 0, outlier: false } }} />`
 */
export function MarkTable({ control, unit, rowFits, refusedRow = null, lockedRows = 0, problems = {} }: MarkTableProps) {
  const { fields, append, remove } = useFieldArray({ control, name: 'marks' });
  const { errors } = useFormState({ control, name: 'marks' });
  const listError = errors.marks?.root?.message ?? errors.marks?.message;
  // Width 0: not laid out yet (a test's jsdom, a first render): the full layout.
  const width = useWindowDimensions().width;
  const compact = width > 0 && width < compactBelow;
  const [openRows, setOpenRows] = useState<Record<string, boolean>>({});

  /** The line under a row: its problem, else a saved-form error, else its place on the fit. */
  const rowLine = (index: number) => {
    const problem = problems[index];
    if (problem) {
      return (
        <Text variant="small" tone="failed" role="alert" testID={`mark-problem-${index}`}>
          {problem.message}
        </Text>
      );
    }
    const rowErrors = errors.marks?.[index];
    const saved = rowErrors?.distance?.message ?? rowErrors?.scaleMm?.message ?? rowErrors?.arrowsShot?.message ?? rowErrors?.note?.message;
    if (compact && saved) {
      return (
        <Text variant="small" tone="failed" role="alert">
          {`Mark ${index + 1}: ${saved}`}
        </Text>
      );
    }
    const fit = rowFits[index];
    if (!fit) return null;
    return (
      <Text variant="small" tone={fit.outlier ? 'failed' : 'soft'} testID={`mark-residual-${index}`}>
        {residualWords(fit)}
      </Text>
    );
  };

  const removeButton = (index: number) => (
    <Button
      label="Remove"
      variant="quiet"
      onPress={() => remove(index)}
      accessibilityLabel={`Remove mark ${index + 1}`}
      testID={`mark-remove-${index}`}
    />
  );

  return (
    <View style={[styles.table, compact && styles.tableCompact]} testID="mark-table">
      {compact && fields.length > 0 ? (
        <View style={styles.compactHead} aria-hidden>
          <Text variant="caption" tone="soft" style={styles.numberColumn}>
            #
          </Text>
          <Text variant="caption" tone="soft" style={styles.wideColumn}>
            {`Distance ${unit}`}
          </Text>
          <Text variant="caption" tone="soft" style={styles.wideColumn}>
            Reading mm
          </Text>
          <Text variant="caption" tone="soft" style={styles.arrowsColumn}>
            Arrows
          </Text>
          <View style={styles.moreColumn} />
        </View>
      ) : null}
      {fields.map((field, index) => {
        const fit = rowFits[index];
        const locked = index < lockedRows;
        const problem = problems[index];
        const flagged = [fit?.outlier && styles.rowOutlier, refusedRow === index && styles.rowRefused, problem && styles.rowProblem];
        if (compact) {
          const open = openRows[field.id] ?? false;
          return (
            <View
              key={field.id}
              style={[styles.compactRow, ...flagged]}
              testID={`mark-row-${index}`}
              role="group"
              aria-label={`Mark ${index + 1}`}
            >
              <View style={styles.compactCells}>
                <Text variant="label" style={styles.numberColumn}>
                  {index + 1}
                </Text>
                <View style={styles.wideColumn}>
                  <CompactNumber
                    control={control}
                    name={`marks.${index}.distance`}
                    label={`Mark ${index + 1} distance, ${unit}`}
                    unit={unit}
                    disabled={locked}
                    invalid={problem?.field === 'distance'}
                    testID={`mark-distance-${index}`}
                  />
                </View>
                <View style={styles.wideColumn}>
                  <CompactNumber
                    control={control}
                    name={`marks.${index}.scaleMm`}
                    label={`Mark ${index + 1} reading, mm`}
                    unit="mm"
                    disabled={locked}
                    invalid={problem?.field === 'scaleMm'}
                    testID={`mark-reading-${index}`}
                  />
                </View>
                <View style={styles.arrowsColumn}>
                  <CompactNumber
                    control={control}
                    name={`marks.${index}.arrowsShot`}
                    label={`Mark ${index + 1} arrows shot`}
                    whole
                    disabled={locked}
                    invalid={false}
                    testID={`mark-arrows-${index}`}
                  />
                </View>
                <Pressable
                  role="button"
                  aria-expanded={open}
                  accessibilityLabel={`${open ? 'Fold' : 'Note and remove,'} mark ${index + 1}`}
                  onPress={() => setOpenRows({ ...openRows, [field.id]: !open })}
                  style={({ pressed }) => [styles.moreColumn, styles.moreButton, pressed && styles.morePressed]}
                  testID={`mark-more-${index}`}
                >
                  <Text variant="label" tone="signal">
                    {open ? '▴' : '⋯'}
                  </Text>
                </Pressable>
              </View>
              {rowLine(index)}
              {open ? (
                <View style={styles.fold}>
                  <FormField
                    control={control}
                    name={`marks.${index}.note`}
                    label={`Note, mark ${index + 1}`}
                    placeholder="Optional"
                    disabled={locked}
                    testID={`mark-note-${index}`}
                  />
                  {locked ? (
                    <Text variant="small" tone="soft" testID={`mark-locked-${index}`}>
                      Saved
                    </Text>
                  ) : (
                    removeButton(index)
                  )}
                </View>
              ) : null}
            </View>
          );
        }
        return (
          <View key={field.id} style={[styles.row, ...flagged]} testID={`mark-row-${index}`} role="group" aria-label={`Mark ${index + 1}`}>
            <View style={styles.rowHead}>
              <Text variant="label">Mark {index + 1}</Text>
              {rowLine(index)}
              <View style={styles.spacer} />
              {locked ? (
                <Text variant="small" tone="soft" testID={`mark-locked-${index}`}>
                  Saved
                </Text>
              ) : (
                removeButton(index)
              )}
            </View>
            <View style={styles.inputs}>
              <View style={styles.numberCell}>
                <FormField
                  control={control}
                  name={`marks.${index}.distance`}
                  label="Distance"
                  unit={unit}
                  numeric
                  disabled={locked}
                  testID={`mark-distance-${index}`}
                />
              </View>
              <View style={styles.numberCell}>
                <FormField
                  control={control}
                  name={`marks.${index}.scaleMm`}
                  label="Reading"
                  unit="mm"
                  numeric
                  disabled={locked}
                  testID={`mark-reading-${index}`}
                />
              </View>
              <View style={styles.smallCell}>
                <FormField
                  control={control}
                  name={`marks.${index}.arrowsShot`}
                  label="Arrows"
                  numeric
                  inputMode="numeric"
                  disabled={locked}
                  testID={`mark-arrows-${index}`}
                />
              </View>
              <View style={styles.noteCell}>
                <FormField
                  control={control}
                  name={`marks.${index}.note`}
                  label="Note"
                  placeholder="Optional"
                  disabled={locked}
                  testID={`mark-note-${index}`}
                />
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
        fullWidth={compact}
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
  rowProblem: { borderColor: colors.failed, borderWidth: borders.focus },
  tableCompact: { gap: space.xs },
  compactHead: { flexDirection: 'row', alignItems: 'flex-end', gap: space.xs, paddingHorizontal: space.xs },
  compactRow: {
    gap: space.xxs,
    paddingVertical: space.xs,
    paddingHorizontal: space.xs,
    borderRadius: radii.sm,
    backgroundColor: colors.surface,
    borderWidth: borders.hairline,
    borderColor: colors.line,
  },
  compactCells: { flexDirection: 'row', alignItems: 'center', gap: space.xs },
  numberColumn: { width: 20, textAlign: 'center' },
  wideColumn: { flex: 1, minWidth: 0 },
  arrowsColumn: { width: 56 },
  moreColumn: { width: layout.minTap },
  moreButton: { height: layout.minTap, alignItems: 'center', justifyContent: 'center', borderRadius: radii.sm },
  morePressed: { backgroundColor: colors.sunken },
  fold: { gap: space.sm, paddingTop: space.xs, paddingLeft: 24 },
  cellBox: {
    flexDirection: 'row',
    alignItems: 'center',
    minHeight: layout.minTap,
    backgroundColor: colors.surface,
    borderColor: colors.lineStrong,
    borderWidth: borders.control,
    borderRadius: radii.sm,
  },
  cellFocused: { outlineColor: colors.focus, outlineStyle: 'solid', outlineWidth: borders.focus, outlineOffset: 1 },
  cellInvalid: { borderColor: colors.failed, borderWidth: borders.focus },
  cellDisabled: { backgroundColor: colors.sunken },
  cellInput: {
    ...type.numeral,
    // The input itself is the tap target: 48 px inside the box's border.
    minHeight: layout.minTap,
    flex: 1,
    minWidth: 0,
    alignSelf: 'stretch',
    paddingHorizontal: space.sm,
    color: colors.ink,
    outlineStyle: 'none' as never,
  },
  cellUnit: { paddingRight: space.xs },
  rowHead: { flexDirection: 'row', alignItems: 'center', flexWrap: 'wrap', columnGap: space.md },
  spacer: { flexGrow: 1 },
  inputs: { flexDirection: 'row', flexWrap: 'wrap', columnGap: space.md, rowGap: space.sm },
  numberCell: { flexGrow: 1, flexBasis: 96, minWidth: 0 },
  smallCell: { flexGrow: 0, flexBasis: 72, minWidth: 0 },
  noteCell: { flexGrow: 2, flexBasis: 200, minWidth: 0 },
});
