import { Pressable, StyleSheet, View } from 'react-native';

import { buildStyle } from '@/components/compare/build-styles';
import { Text } from '@/components/ui/text';
import { borders, colors, layout, radii, space } from '@/components/theme';

export interface PickableBuild {
  id: number;
  name: string;
  /** One line under the name (grains, speed). */
  detail: string;
  /** Why it cannot be chosen (e.g. no sight-in yet), or null. */
  unavailable: string | null;
}

export interface BuildPickerProps {
  builds: readonly PickableBuild[];
  /** Chosen ids, in the order chosen (the first is the reference). */
  chosen: readonly number[];
  onChange: (chosen: number[]) => void;
  max?: number;
}

/**
 * The builds to compare, as 48 px check buttons that wrap: a chosen one shows
 * its line style's colour, its place in the comparison and a tick, so the
 * choice never relies on colour alone. A build without a sight-in cannot be
 * chosen and says why.
 * Example: `<BuildPicker builds={pickable} chosen={[3, 5]} onChange={setChosen} />`
 */
export function BuildPicker({ builds, chosen, onChange, max = 4 }: BuildPickerProps) {
  const full = chosen.length >= max;
  return (
    <View style={styles.row} role="group" aria-label="Builds to compare">
      {builds.map((build) => {
        const place = chosen.indexOf(build.id);
        const selected = place >= 0;
        const disabled = build.unavailable !== null || (!selected && full);
        const style = selected ? buildStyle(place) : null;
        return (
          <Pressable
            key={build.id}
            role="checkbox"
            aria-checked={selected}
            aria-disabled={disabled}
            disabled={disabled}
            testID={`compare-pick-${build.id}`}
            accessibilityLabel={`${build.name}${selected ? `, line ${place + 1}` : ''}${build.unavailable ? `, ${build.unavailable}` : ''}`}
            onPress={() => onChange(selected ? chosen.filter((id) => id !== build.id) : [...chosen, build.id])}
            style={({ pressed }) => [
              styles.chip,
              selected && { borderColor: style!.color, backgroundColor: colors.surface },
              disabled && styles.disabled,
              pressed && styles.pressed,
            ]}
          >
            <View style={[styles.box, selected && { backgroundColor: style!.color, borderColor: style!.color }]}>
              {selected ? <Text style={styles.place}>{place + 1}</Text> : null}
            </View>
            <View style={styles.words}>
              <Text variant="label">{build.name}</Text>
              <Text variant="caption" tone="soft">
                {build.unavailable ?? build.detail}
              </Text>
            </View>
          </Pressable>
        );
      })}
    </View>
  );
}

const styles = StyleSheet.create({
  row: { flexDirection: 'row', flexWrap: 'wrap', gap: space.sm },
  chip: {
    minHeight: layout.minTap,
    flexDirection: 'row',
    alignItems: 'center',
    gap: space.sm,
    paddingVertical: space.xs,
    paddingHorizontal: space.md,
    borderRadius: radii.md,
    borderWidth: borders.control,
    borderColor: colors.lineStrong,
    backgroundColor: colors.sunken,
    flexGrow: 1,
    flexBasis: 160,
  },
  disabled: { opacity: 0.6 },
  pressed: { backgroundColor: colors.line },
  box: {
    width: 26,
    height: 26,
    borderRadius: radii.sm,
    borderWidth: borders.control,
    borderColor: colors.lineStrong,
    backgroundColor: colors.surface,
    alignItems: 'center',
    justifyContent: 'center',
  },
  place: { color: colors.onSignal, fontSize: 15, lineHeight: 18 },
  words: { flexShrink: 1, gap: 0 },
});
