import { useId } from 'react';
import { Pressable, StyleSheet, View } from 'react-native';

import { bigTap } from '@/components/level/result-buttons';
import { Text } from '@/components/ui/text';
import { borders, colors, radii, space } from '@/components/theme';

export interface BigChoiceProps<TValue extends string> {
  label: string;
  hint?: string;
  error?: string;
  options: ReadonlyArray<{ value: TValue; label: string }>;
  value: TValue | null | undefined;
  onChange: (value: TValue) => void;
  testID?: string;
}

type PressState = { pressed: boolean; hovered?: boolean; focused?: boolean };

/**
 * A row of radio buttons at least 64 px tall (hands busy with a bow), wrapping
 * on narrow screens; the chosen one is filled and dotted, never colour alone.
 * Example: `<BigChoice label="Where" options={[{ value: 'bench', label: 'Bench' }]} value={place} onChange={setPlace} />`
 */
export function BigChoice<TValue extends string>({ label, hint, error, options, value, onChange, testID }: BigChoiceProps<TValue>) {
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
              onPress={() => onChange(option.value)}
              style={({ pressed, hovered, focused }: PressState) => [
                styles.option,
                selected ? styles.selected : (pressed || hovered) && styles.hovered,
                error && !selected ? styles.optionError : null,
                focused && styles.focused,
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
    minHeight: bigTap,
    flexGrow: 1,
    flexDirection: 'row',
    alignItems: 'center',
    justifyContent: 'center',
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
  dot: { width: 14, height: 14, borderRadius: 7, borderWidth: borders.control, borderColor: colors.lineStrong },
  dotSelected: { backgroundColor: colors.signalOnSlate, borderColor: colors.onSlate },
});
