import { useId } from 'react';
import { Pressable, StyleSheet, View } from 'react-native';

import { Text } from '@/components/ui/text';
import { borders, colors, layout, radii, space } from '@/components/theme';

export interface SegmentOption<TValue extends string> {
  value: TValue;
  label: string;
}

export interface SegmentedControlProps<TValue extends string> {
  /** Visible label above the choices (also the group's accessible name). */
  label: string;
  hint?: string;
  error?: string;
  options: readonly SegmentOption<TValue>[];
  value: TValue | undefined;
  onChange: (value: TValue) => void;
  disabled?: boolean;
  testID?: string;
}

type PressState = { pressed: boolean; hovered?: boolean; focused?: boolean };

/**
 * A small set of mutually exclusive choices as a row of 48 px radio buttons
 * that wraps on narrow screens. The chosen one is filled and marked with a dot,
 * so the choice never relies on colour alone.
 * Example: `<SegmentedControl label="Hand" options={[{ value: 'right', label: 'Right' }, { value: 'left', label: 'Left' }]} value={hand} onChange={setHand} />`
 */
export function SegmentedControl<TValue extends string>({
  label,
  hint,
  error,
  options,
  value,
  onChange,
  disabled = false,
  testID,
}: SegmentedControlProps<TValue>) {
  const id = useId().replace(/:/g, '');
  return (
    <View style={styles.field} testID={testID}>
      <Text variant="label" nativeID={`${id}-label`}>
        {label}
      </Text>
      {hint ? (
        <Text variant="small" tone="soft">
          {hint}
        </Text>
      ) : null}
      <View role="radiogroup" aria-labelledby={`${id}-label`} style={styles.row}>
        {options.map((option) => {
          const selected = option.value === value;
          return (
            <Pressable
              key={option.value}
              role="radio"
              aria-checked={selected}
              aria-disabled={disabled}
              disabled={disabled}
              onPress={() => onChange(option.value)}
              style={({ pressed, hovered, focused }: PressState) => [
                styles.option,
                selected ? styles.selected : (pressed || hovered) && styles.hovered,
                error && !selected ? styles.optionError : null,
                focused && styles.focused,
                disabled && styles.disabled,
              ]}
            >
              <View style={[styles.dot, selected && styles.dotSelected]} />
              <Text variant="label" style={{ color: selected ? colors.onSlate : colors.ink }}>
                {option.label}
              </Text>
            </Pressable>
          );
        })}
      </View>
      {error ? (
        <Text variant="small" tone="failed" role="alert">
          {error}
        </Text>
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  field: { gap: space.xs, alignSelf: 'stretch' },
  row: { flexDirection: 'row', flexWrap: 'wrap', gap: space.sm, marginTop: space.xxs },
  option: {
    minHeight: layout.minTap,
    flexDirection: 'row',
    alignItems: 'center',
    gap: space.sm,
    paddingHorizontal: space.lg,
    borderRadius: radii.md,
    borderWidth: borders.control,
    borderColor: colors.lineStrong,
    backgroundColor: colors.surface,
  },
  selected: { backgroundColor: colors.slate, borderColor: colors.slate },
  hovered: { backgroundColor: colors.sunken },
  optionError: { borderColor: colors.failed },
  focused: { outlineColor: colors.focus, outlineStyle: 'solid', outlineWidth: borders.focus, outlineOffset: 2 },
  disabled: { opacity: 0.6 },
  dot: { width: 12, height: 12, borderRadius: 6, borderWidth: borders.control, borderColor: colors.lineStrong },
  dotSelected: { backgroundColor: colors.signalOnSlate, borderColor: colors.onSlate },
});
