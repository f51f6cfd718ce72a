import { Link, type Href } from 'expo-router';
import { forwardRef, type ComponentRef } from 'react';
import { Pressable, StyleSheet, type PressableProps, type StyleProp, type ViewStyle } from 'react-native';

/** Press state as react-native-web reports it (hovered and focused are web-only). */
export interface PressState {
  pressed: boolean;
  hovered?: boolean;
  focused?: boolean;
}

export interface LinkPressableProps extends Omit<PressableProps, 'style' | 'onPress'> {
  href: Href;
  /** Style from the press state (pressed, hovered, focused). */
  style?: (state: PressState) => StyleProp<ViewStyle>;
}

interface StatefulPressableProps extends Omit<PressableProps, 'style'> {
  pressStyle?: (state: PressState) => StyleProp<ViewStyle>;
}

// Link's asChild merges the child's `style` as a plain object, which drops a style
// function (and arrays); so the function travels under another name and is flattened here.
const StatefulPressable = forwardRef<ComponentRef<typeof Pressable>, StatefulPressableProps>(function StatefulPressable(
  { pressStyle, ...rest },
  ref,
) {
  return (
    <Pressable ref={ref} {...rest} style={(state) => (pressStyle ? StyleSheet.flatten(pressStyle(state as PressState)) : undefined)} />
  );
});

/**
 * A Pressable that is a router link (an <a href> on the web) and still gets
 * pressed / hovered / focused styles.
 * Example: `<LinkPressable href="/account" style={({ hovered }) => [styles.row, hovered && styles.hover]}>…</LinkPressable>`
 */
export function LinkPressable({ href, style, ...rest }: LinkPressableProps) {
  return (
    <Link href={href} asChild>
      <StatefulPressable role="link" {...rest} pressStyle={style} />
    </Link>
  );
}
