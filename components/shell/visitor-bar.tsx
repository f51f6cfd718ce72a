import { StyleSheet, View } from 'react-native';

import { Wordmark } from '@/components/shell/wordmark';
import { LinkPressable, type PressState } from '@/components/ui/link-pressable';
import { Text } from '@/components/ui/text';
import { borders, colors, layout, space } from '@/components/theme';

/**
 * The top bar of pages open to visitors: the wordmark and a way to sign in.
 * Example: `<VisitorBar />`
 */
export function VisitorBar() {
  return (
    <View style={styles.bar} role="banner">
      <View style={styles.inner}>
        <Wordmark size={26} />
        <LinkPressable
          href="/sign-in"
          style={({ hovered, focused }: PressState) => [styles.link, hovered && styles.hovered, focused && styles.focused]}
        >
          <Text variant="label" tone="onSlate">
            Sign in
          </Text>
        </LinkPressable>
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  bar: { backgroundColor: colors.slate, paddingHorizontal: space.lg, alignItems: 'center' },
  inner: {
    width: '100%',
    maxWidth: layout.contentMax,
    minHeight: 56,
    flexDirection: 'row',
    alignItems: 'center',
    justifyContent: 'space-between',
  },
  link: { minHeight: layout.minTap, justifyContent: 'center', paddingHorizontal: space.md, borderRadius: 8 },
  hovered: { backgroundColor: colors.slateRaised },
  focused: { outlineColor: colors.onSlate, outlineStyle: 'solid', outlineWidth: borders.focus },
});
