import type { Href } from 'expo-router';
import type { ReactNode } from 'react';
import { StyleSheet, View, type StyleProp, type ViewStyle } from 'react-native';

import { LinkPressable, type PressState } from '@/components/ui/link-pressable';
import { borders, colors, radii, space } from '@/components/theme';

export interface CardProps {
  children: ReactNode;
  /** Makes the whole card a link (an <a> on the web). */
  href?: Href;
  /** Accessible name when the card is a link. */
  accessibilityLabel?: string;
  /** "raised" = surface with a border (default); "flat" = sunken well without border. */
  tone?: 'raised' | 'flat';
  testID?: string;
  style?: StyleProp<ViewStyle>;
}

/**
 * A surface that groups related content; optionally a link.
 * Example: `<Card href="/bows/3" accessibilityLabel="Open Ridge Runner"><Text>Ridge Runner</Text></Card>`
 */
export function Card({ children, href, accessibilityLabel, tone = 'raised', testID, style }: CardProps) {
  const look = [styles.base, tone === 'flat' ? styles.flat : styles.raised, style];
  if (!href) {
    return (
      <View testID={testID} style={look}>
        {children}
      </View>
    );
  }
  return (
    <LinkPressable
      href={href}
      accessibilityLabel={accessibilityLabel}
      testID={testID}
      style={({ pressed, hovered, focused }: PressState) => [...look, (pressed || hovered) && styles.hovered, focused && styles.focused]}
    >
      {children}
    </LinkPressable>
  );
}

const styles = StyleSheet.create({
  base: { borderRadius: radii.lg, padding: space.lg, gap: space.sm },
  raised: { backgroundColor: colors.surface, borderWidth: borders.hairline, borderColor: colors.line },
  flat: { backgroundColor: colors.sunken },
  hovered: { borderColor: colors.lineStrong, backgroundColor: colors.surface },
  focused: { outlineColor: colors.focus, outlineStyle: 'solid', outlineWidth: borders.focus, outlineOffset: 2 },
});
