import { Link, type Href } from 'expo-router';
import { Pressable, StyleSheet } from 'react-native';

import { Text } from '@/components/ui/text';
import { borders, colors, layout } from '@/components/theme';

export interface TextLinkProps {
  label: string;
  href: Href;
  testID?: string;
}

/**
 * An underlined ember link with a 48 px tall tap area.
 * Example: `<TextLink href="/sign-up" label="Create an account" />`
 */
export function TextLink({ label, href, testID }: TextLinkProps) {
  return (
    <Link href={href} asChild>
      <Pressable
        role="link"
        testID={testID}
        style={({ focused }: { pressed: boolean; focused?: boolean }) => [styles.tap, focused && styles.focused]}
      >
        {({ hovered }: { pressed: boolean; hovered?: boolean }) => (
          <Text variant="label" tone="signal" style={[styles.text, hovered && styles.hovered]}>
            {label}
          </Text>
        )}
      </Pressable>
    </Link>
  );
}

const styles = StyleSheet.create({
  tap: { minHeight: layout.minTap, justifyContent: 'center', alignSelf: 'flex-start' },
  text: { textDecorationLine: 'underline' },
  hovered: { color: colors.signalPressed },
  focused: { outlineColor: colors.focus, outlineStyle: 'solid', outlineWidth: borders.focus, outlineOffset: 2 },
});
