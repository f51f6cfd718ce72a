import type { ReactElement } from 'react';
import { StyleSheet, View } from 'react-native';

import { CheckIcon, ClockIcon, DashCircleIcon, ErrorIcon, type IconProps } from '@/components/ui/icons';
import { Text } from '@/components/ui/text';
import { borders, colors, radii, space } from '@/components/theme';

/** verified = checked and unchanged since; due = a change or the set age calls for a check; failed = last check failed; none = never checked. */
export type Readiness = 'verified' | 'due' | 'failed' | 'none';

export interface ReadinessBadgeProps {
  state: Readiness;
  /** Replaces the default word ("Verified", "Check due", "Failed", "Not checked"). */
  label?: string;
  /** What the state is about, read before the word by screen readers, e.g. "Level". */
  subject?: string;
  testID?: string;
}

const looks: Record<Readiness, { word: string; text: string; ground: string; icon: (props: IconProps) => ReactElement }> = {
  verified: { word: 'Verified', text: colors.verified, ground: colors.verifiedTint, icon: CheckIcon },
  due: { word: 'Check due', text: colors.due, ground: colors.dueTint, icon: ClockIcon },
  failed: { word: 'Failed', text: colors.failed, ground: colors.failedTint, icon: ErrorIcon },
  none: { word: 'Not checked', text: colors.none, ground: colors.noneTint, icon: DashCircleIcon },
};

/**
 * Readiness shown with colour, an icon of its own shape and a word, never colour alone.
 * Example: `<ReadinessBadge state="due" subject="Level" />` → "Check due"
 */
export function ReadinessBadge({ state, label, subject, testID }: ReadinessBadgeProps) {
  const look = looks[state];
  const Icon = look.icon;
  const word = label ?? look.word;
  return (
    <View
      testID={testID}
      accessibilityLabel={subject ? `${subject}: ${word}` : word}
      style={[styles.badge, { backgroundColor: look.ground, borderColor: look.text }]}
    >
      <Icon size={18} color={look.text} />
      <Text variant="label" style={[styles.word, { color: look.text }]}>
        {word}
      </Text>
    </View>
  );
}

const styles = StyleSheet.create({
  badge: {
    flexDirection: 'row',
    alignItems: 'center',
    alignSelf: 'flex-start',
    gap: space.xs + 2,
    paddingVertical: space.xs,
    paddingLeft: space.sm,
    paddingRight: space.md,
    borderRadius: radii.pill,
    borderWidth: borders.hairline,
  },
  word: { fontSize: 15, lineHeight: 20 },
});
