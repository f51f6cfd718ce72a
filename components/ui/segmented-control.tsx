import { useId, type ReactElement } from 'react';
import { Pressable, StyleSheet, View } from 'react-native';

import type { IconProps } from '@/components/ui/icons';
import { Text } from '@/components/ui/text';
import { borders, colors, layout, radii, space } from '@/components/theme';

export interface SegmentOption<TValue extends string> {
  value: TValue;
  label: string;
  /** A second, smaller line under the label (e.g. what a result means). */
  hint?: string;
  /** An icon in place of the dot (its own shape, so the choice still never relies on colour alone). */
  icon?: (props: IconProps) => ReactElement;
  /** The chosen option's own colours (text and edge, ground) instead of the slate fill. */
  tone?: { text: string; ground: string };
  testID?: string;
}

export interface SegmentedControlProps<TValue extends string> {
  /** Visible label above the choices (also the group's accessible name). */
  label: string;
  hint?: string;
  error?: string;
  options: readonly SegmentOption<TValue>[];
  value: TValue | null | undefined;
  onChange: (value: TValue) => void;
  disabled?: boolean;
  /**
   * 'regular': 48 px buttons sized to their words; 'large': 64 px buttons that
   * share the row (layout.bigTap), for hands busy with a bow. Default 'regular'.
   */
  size?: 'regular' | 'large';
  /** Large size: the width (px) below which an option wraps to the next line, e.g. 150 for two by two. */
  optionBasis?: number;
  testID?: string;
}

type PressState = { pressed: boolean; hovered?: boolean; focused?: boolean };

/**
 * A small set of mutually exclusive choices as a row of radio buttons that
 * wraps on narrow screens. The chosen one is filled and marked with a dot (or
 * the option's icon), so the choice never relies on colour alone.
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
  size = 'regular',
  optionBasis,
  testID,
}: SegmentedControlProps<TValue>) {
  const id = useId().replace(/:/g, '');
  const large = size === 'large';
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
          const Icon = option.icon;
          const ink = selected ? (option.tone?.text ?? colors.onSlate) : colors.ink;
          return (
            <Pressable
              key={option.value}
              role="radio"
              aria-checked={selected}
              aria-disabled={disabled}
              disabled={disabled}
              onPress={() => onChange(option.value)}
              testID={option.testID}
              style={({ pressed, hovered, focused }: PressState) => [
                styles.option,
                large && styles.large,
                large && optionBasis !== undefined && { flexBasis: optionBasis },
                selected
                  ? option.tone
                    ? { backgroundColor: option.tone.ground, borderColor: option.tone.text, borderWidth: 3 }
                    : styles.selected
                  : (pressed || hovered) && styles.hovered,
                error && !selected ? styles.optionError : null,
                focused && styles.focused,
                disabled && styles.disabled,
              ]}
            >
              {Icon ? (
                <Icon size={28} color={ink} />
              ) : (
                <View style={[styles.dot, large && styles.dotLarge, selected && styles.dotSelected]} />
              )}
              {option.hint ? (
                <View style={styles.words}>
                  <Text variant="label" style={{ color: ink }}>
                    {option.label}
                  </Text>
                  <Text variant="caption" tone="soft" numberOfLines={2}>
                    {option.hint}
                  </Text>
                </View>
              ) : (
                <Text variant="label" style={{ color: ink }}>
                  {option.label}
                </Text>
              )}
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
  large: { minHeight: layout.bigTap, flexGrow: 1, justifyContent: 'center', paddingVertical: space.sm },
  selected: { backgroundColor: colors.slate, borderColor: colors.slate },
  hovered: { backgroundColor: colors.sunken },
  optionError: { borderColor: colors.failed },
  focused: { outlineColor: colors.focus, outlineStyle: 'solid', outlineWidth: borders.focus, outlineOffset: 2 },
  disabled: { opacity: 0.6 },
  dot: { width: 12, height: 12, borderRadius: 6, borderWidth: borders.control, borderColor: colors.lineStrong },
  dotLarge: { width: 14, height: 14, borderRadius: 7 },
  dotSelected: { backgroundColor: colors.signalOnSlate, borderColor: colors.onSlate },
  words: { flex: 1, minWidth: 0 },
});
