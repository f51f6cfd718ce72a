import { forwardRef, useId, useState } from 'react';
import { StyleSheet, TextInput, View, type TextInputProps } from 'react-native';

import { Text } from '@/components/ui/text';
import { borders, colors, layout, radii, space, type } from '@/components/theme';

export interface TextFieldProps extends Omit<TextInputProps, 'style' | 'editable'> {
  /** Visible label above the input (also its accessible name). */
  label: string;
  /** Helper text under the label, e.g. "At least 10 characters". */
  hint?: string;
  /** Error text under the input; turns the border red and marks the input invalid. */
  error?: string;
  /** Unit shown inside the input's right edge, e.g. "yd", "gr", "mm". */
  unit?: string;
  /** Use the condensed numeral face and a decimal keyboard. */
  numeric?: boolean;
  disabled?: boolean;
}

/**
 * A labelled single-line input with optional hint, error and unit suffix.
 * Label, hint and error are tied to the input for screen readers.
 * Example: `<TextField label="Draw weight" unit="lb" numeric value={text} onChangeText={setText} />`
 */
export const TextField = forwardRef<TextInput, TextFieldProps>(function TextField(
  { label, hint, error, unit, numeric = false, disabled = false, onFocus, onBlur, ...inputProps },
  ref,
) {
  const id = useId().replace(/:/g, '');
  const [focused, setFocused] = useState(false);
  const labelId = `${id}-label`;
  const hintId = `${id}-hint`;
  const errorId = `${id}-error`;
  const describedBy = [hint ? hintId : null, error ? errorId : null].filter(Boolean).join(' ') || undefined;

  return (
    <View style={styles.field}>
      <Text variant="label" nativeID={labelId}>
        {label}
      </Text>
      {hint ? (
        <Text variant="small" tone="soft" nativeID={hintId}>
          {hint}
        </Text>
      ) : null}
      <View style={[styles.box, focused ? styles.boxFocused : null, error ? styles.boxError : null, disabled ? styles.boxDisabled : null]}>
        <TextInput
          ref={ref}
          aria-labelledby={labelId}
          aria-describedby={describedBy}
          aria-invalid={error ? true : undefined}
          editable={!disabled}
          keyboardType={numeric ? 'decimal-pad' : undefined}
          inputMode={numeric ? 'decimal' : undefined}
          placeholderTextColor={colors.inkSoft}
          {...inputProps}
          onFocus={(event) => {
            setFocused(true);
            onFocus?.(event);
          }}
          onBlur={(event) => {
            setFocused(false);
            onBlur?.(event);
          }}
          style={[styles.input, numeric ? styles.inputNumeric : null]}
        />
        {unit ? (
          <Text variant="label" tone="soft" style={styles.unit}>
            {unit}
          </Text>
        ) : null}
      </View>
      {error ? (
        <Text variant="small" tone="failed" nativeID={errorId} role="alert" style={styles.error}>
          {error}
        </Text>
      ) : null}
    </View>
  );
});

const styles = StyleSheet.create({
  field: { gap: space.xs, alignSelf: 'stretch' },
  box: {
    flexDirection: 'row',
    alignItems: 'center',
    minHeight: layout.minTap + 4,
    backgroundColor: colors.surface,
    borderColor: colors.lineStrong,
    borderWidth: borders.control,
    borderRadius: radii.md,
    marginTop: space.xxs,
  },
  boxError: { borderColor: colors.failed, borderWidth: borders.focus },
  // Focus draws an outer ring, so an error's red border stays visible while typing.
  boxFocused: { outlineColor: colors.focus, outlineStyle: 'solid', outlineWidth: borders.focus, outlineOffset: 1 },
  boxDisabled: { backgroundColor: colors.sunken },
  input: {
    ...type.body,
    flex: 1,
    minWidth: 0,
    alignSelf: 'stretch',
    paddingHorizontal: space.md,
    paddingVertical: space.sm,
    color: colors.ink,
    // The box draws the focus state; the browser outline would double it.
    outlineStyle: 'none' as never,
  },
  inputNumeric: { ...type.numeral },
  unit: { paddingRight: space.md },
  error: { marginTop: space.xxs },
});
