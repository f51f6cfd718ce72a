import type { Href } from 'expo-router';
import { StyleSheet } from 'react-native';

import { LinkPressable, type PressState } from '@/components/ui/link-pressable';

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
    <LinkPressable href={href} testID={testID} style={({ focused }: PressState) => [styles.tap, focused && styles.focused]}>
      {({ hovered }: PressState) => (
        <Text variant="label" tone="signal" style={[styles.text, hovered && styles.hovered]}>
          {label}
        </Text>
      )}
    </LinkPressable>
  );
}

const styles = StyleSheet.create({
  tap: { minHeight: layout.minTap, justifyContent: 'center', alignSelf: 'flex-start' },
  text: { textDecorationLine: 'underline' },
  hovered: { color: colors.signalPressed },
  focused: { outlineColor: colors.focus, outlineStyle: 'solid', outlineWidth: borders.focus, outlineOffset: 2 },
});
