import { useId } from 'react';
import { Pressable, StyleSheet, View } from 'react-native';

import { resultHints, resultLabels } from '@/components/level/level-words';
import { resultColors, resultIcons } from '@/components/level/result-icons';
import { Text } from '@/components/ui/text';
import { borders, colors, radii, space } from '@/components/theme';
import type { LevelResult } from '@/shared/level';

/** Height of a result button, px: larger than the usual 48 because hands are busy with the bow. */
export const bigTap = 64;

const results: LevelResult[] = ['pass', 'adjusted', 'fail', 'skipped'];

export interface ResultButtonsProps {
  value: LevelResult | null;
  onChange: (result: LevelResult) => void;
  error?: string;
  disabled?: boolean;
  /** Prefix for test ids, e.g. the step key. */
  testID?: string;
}

type PressState = { pressed: boolean; hovered?: boolean; focused?: boolean };

/**
 * The four results of a step as large radio buttons, two by two: icon, word and a hint.
 * Example: `<ResultButtons value={result} onChange={setResult} />`
 */
export function ResultButtons({ value, onChange, error, disabled = false, testID }: ResultButtonsProps) {
  const id = useId().replace(/:/g, '');
  return (
    <View style={styles.field}>
      <Text variant="label" nativeID={`${id}-label`}>
        Result
      </Text>
      <View role="radiogroup" aria-labelledby={`${id}-label`} style={styles.grid}>
        {results.map((result) => {
          const selected = value === result;
          const look = resultColors[result];
          const Icon = resultIcons[result];
          return (
            <Pressable
              key={result}
              role="radio"
              aria-checked={selected}
              aria-disabled={disabled}
              disabled={disabled}
              onPress={() => onChange(result)}
              testID={testID ? `${testID}-result-${result}` : undefined}
              style={({ pressed, hovered, focused }: PressState) => [
                styles.option,
                selected ? { backgroundColor: look.ground, borderColor: look.text, borderWidth: 3 } : (pressed || hovered) && styles.hovered,
                error && !selected ? styles.optionError : null,
                focused && styles.focused,
                disabled && styles.disabled,
              ]}
            >
              <Icon size={28} color={selected ? look.text : colors.ink} />
              <View style={styles.words}>
                <Text variant="label" style={{ color: selected ? look.text : colors.ink }}>
                  {resultLabels[result]}
                </Text>
                <Text variant="caption" tone="soft" numberOfLines={2}>
                  {resultHints[result]}
                </Text>
              </View>
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
  grid: { flexDirection: 'row', flexWrap: 'wrap', gap: space.sm },
  option: {
    flexGrow: 1,
    flexBasis: 150,
    minHeight: bigTap,
    flexDirection: 'row',
    alignItems: 'center',
    gap: space.sm,
    paddingHorizontal: space.md,
    paddingVertical: space.sm,
    borderRadius: radii.md,
    borderWidth: borders.control,
    borderColor: colors.lineStrong,
    backgroundColor: colors.surface,
  },
  words: { flex: 1, minWidth: 0 },
  hovered: { backgroundColor: colors.sunken },
  optionError: { borderColor: colors.failed },
  focused: { outlineColor: colors.focus, outlineStyle: 'solid', outlineWidth: borders.focus, outlineOffset: 2 },
  disabled: { opacity: 0.6 },
});
