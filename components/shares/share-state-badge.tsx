import { StyleSheet, View } from 'react-native';

import { Text } from '@/components/ui/text';
import { borders, colors, radii, space } from '@/components/theme';
import type { ShareState } from '@/shared/share';

const looks: Record<ShareState, { word: string; text: string; ground: string }> = {
  invited: { word: 'Invited, not yet accepted', text: colors.due, ground: colors.dueTint },
  active: { word: 'Active', text: colors.verified, ground: colors.verifiedTint },
  revoked: { word: 'Ended', text: colors.none, ground: colors.noneTint },
};

/**
 * A share's state as words on a tinted pill (never colour alone).
 * Example: `<ShareStateBadge state="active" />` → "Active"
 */
export function ShareStateBadge({ state }: { state: ShareState }) {
  const look = looks[state];
  return (
    <View style={[styles.pill, { backgroundColor: look.ground, borderColor: look.text }]}>
      <Text variant="label" style={{ color: look.text }}>
        {look.word}
      </Text>
    </View>
  );
}

const styles = StyleSheet.create({
  pill: {
    alignSelf: 'flex-start',
    paddingVertical: space.xxs,
    paddingHorizontal: space.md,
    borderRadius: radii.pill,
    borderWidth: borders.hairline,
  },
});
