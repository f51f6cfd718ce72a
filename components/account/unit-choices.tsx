import { StyleSheet, View } from 'react-native';

import { useUpdateProfile } from '@/components/auth/api';
import { Banner } from '@/components/ui/banner';
import { SegmentedControl } from '@/components/ui/segmented-control';
import { space } from '@/components/theme';
import type { User } from '@/shared/auth';

const distanceOptions = [
  { value: 'yd', label: 'Yards' },
  { value: 'm', label: 'Metres' },
] as const;
const lengthOptions = [
  { value: 'mm', label: 'Millimetres' },
  { value: 'in', label: 'Inches' },
] as const;

/**
 * The units the archer works in; saved as soon as one is picked.
 * Example: `<UnitChoices user={me} />`
 */
export function UnitChoices({ user }: { user: User }) {
  const update = useUpdateProfile();
  return (
    <View style={styles.group}>
      <SegmentedControl
        label="Distances in"
        hint="Sight-in distances, tapes and field cards"
        options={distanceOptions}
        value={update.variables?.distanceUnit ?? user.distanceUnit}
        onChange={(distanceUnit) => update.mutate({ distanceUnit })}
        disabled={update.isPending}
      />
      <SegmentedControl
        label="Lengths in"
        hint="Sight radius, peep height, draw length and arrow lengths on forms (tapes are always printed in millimetres)"
        options={lengthOptions}
        value={update.variables?.lengthUnit ?? user.lengthUnit}
        onChange={(lengthUnit) => update.mutate({ lengthUnit })}
        disabled={update.isPending}
      />
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
