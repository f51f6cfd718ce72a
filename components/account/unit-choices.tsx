import { StyleSheet, View } from 'react-native';

import { useUpdateProfile } from '@/components/auth/api';
import { Banner } from '@/components/ui/banner';
import { SegmentedControl, type SegmentOption } from '@/components/ui/segmented-control';
import { Text } from '@/components/ui/text';
import { space } from '@/components/theme';
import type { ProfileUpdate, User } from '@/shared/auth';

type Choice = {
  key: keyof Omit<ProfileUpdate, 'name'>;
  label: string;
  hint: string;
  options: readonly SegmentOption<string>[];
};

const choices: readonly Choice[] = [
  {
    key: 'distanceUnit',
    label: 'Distances in',
    hint: 'Sight-in distances, tapes and field cards',
    options: [
      { value: 'yd', label: 'Yards' },
      { value: 'm', label: 'Metres' },
    ],
  },
  {
    key: 'lengthUnit',
    label: 'Lengths in',
    hint: 'Draw length, sight radius, peep height, tape width and arrow lengths on forms (scale readings and printed tapes stay in millimetres)',
    options: [
      { value: 'in', label: 'Inches' },
      { value: 'mm', label: 'Millimetres' },
    ],
  },
  {
    key: 'altitudeUnit',
    label: 'Altitude in',
    hint: 'Where you sighted in and where you will hunt',
    options: [
      { value: 'ft', label: 'Feet' },
      { value: 'm', label: 'Metres' },
    ],
  },
  {
    key: 'temperatureUnit',
    label: 'Temperature in',
    hint: 'The air at the range and on the hunt',
    options: [
      { value: 'F', label: '°F' },
      { value: 'C', label: '°C' },
    ],
  },
  {
    key: 'speedUnit',
    label: 'Arrow speed in',
    hint: 'Chronograph readings and fitted speeds',
    options: [
      { value: 'fps', label: 'fps' },
      { value: 'mps', label: 'm/s' },
    ],
  },
  {
    key: 'massUnit',
    label: 'Arrow weights in',
    hint: 'Points, inserts, nocks and vanes; grains are the trade’s usual unit',
    options: [
      { value: 'gr', label: 'Grains' },
      { value: 'g', label: 'Grams' },
    ],
  },
];

/**
 * The units the archer works in; each is saved as soon as it is picked, and
 * "Saved" says so. Forms show and accept values in these units and store
 * them as before (mm, m, °C, fps, grains: shared/units.ts).
 * Example: `<UnitChoices user={me} />`
 */
export function UnitChoices({ user }: { user: User }) {
  const update = useUpdateProfile();
  const pendingValue = (key: Choice['key']) => (update.isPending ? update.variables?.[key] : undefined);
  return (
    <View style={styles.group} testID="unit-choices">
      {choices.map((choice) => (
        <SegmentedControl<string>
          key={choice.key}
          label={choice.label}
          hint={choice.hint}
          options={choice.options}
          value={pendingValue(choice.key) ?? user[choice.key]}
          onChange={(value) => update.mutate({ [choice.key]: value } as ProfileUpdate)}
          disabled={update.isPending}
          testID={`unit-${choice.key}`}
        />
      ))}
      <View accessibilityLiveRegion="polite">
        {update.isSuccess ? (
          <Text variant="small" tone="soft" testID="units-saved">
            Saved.
          </Text>
        ) : null}
      </View>
      {update.isError ? (
        <Banner tone="error" title="Could not save your units">
          {update.error.message}
        </Banner>
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  group: { gap: space.lg },
});
