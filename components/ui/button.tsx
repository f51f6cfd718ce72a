import type { Href } from 'expo-router';
import type { ReactElement } from 'react';
import { ActivityIndicator, Pressable, StyleSheet, View, type StyleProp, type ViewStyle } from 'react-native';

import type { IconProps } from '@/components/ui/icons';
import { LinkPressable, type PressState } from '@/components/ui/link-pressable';
import { Text } from '@/components/ui/text';
import { borders, colors, layout, radii, space } from '@/components/theme';

export type ButtonVariant = 'primary' | 'secondary' | 'danger' | 'quiet';

export interface ButtonProps {
  label: string;
  /** Called on press (ignored while disabled or pending). */
  onPress?: () => void;
  /** Makes the button a link to a route (rendered as an <a> on the web). */
  href?: Href;
  /** primary = ember (one per view), secondary = outlined, danger = red, quiet = text only. Default primary. */
  variant?: ButtonVariant;
  /** Shows a spinner and `pendingLabel`; the button is disabled meanwhile. */
  pending?: boolean;
  /** Label while pending, e.g. "Signing in…". Defaults to `label`. */
  pendingLabel?: string;
  disabled?: boolean;
  /** An icon component from components/ui/icons, drawn before the label. */
  icon?: (props: IconProps) => ReactElement;
  /** Stretch to the container's width (default: fit the label). */
  fullWidth?: boolean;
  accessibilityLabel?: string;
  testID?: string;
  style?: StyleProp<ViewStyle>;
}

const palette: Record<ButtonVariant, { ground: string; pressed: string; text: string; border: string }> = {
  primary: { ground: colors.signal, pressed: colors.signalPressed, text: colors.onSignal, border: colors.signal },
  secondary: { ground: colors.surface, pressed: colors.sunken, text: colors.ink, border: colors.lineStrong },
  danger: { ground: colors.failed, pressed: '#862020', text: colors.surface, border: colors.failed },
  quiet: { ground: 'transparent', pressed: colors.sunken, text: colors.signal, border: 'transparent' },
};

/**
 * A button at least 48 px tall, with a pending state for submits.
 * Example: `<Button label="Sign in" pendingLabel="Signing in…" pending={isPending} onPress={submit} />`
 */
export function Button({
  label,
  onPress,
  href,
  variant = 'primary',
  pending = false,
  pendingLabel,
  disabled = false,
  icon: Icon,
  fullWidth = false,
  accessibilityLabel,
  testID,
  style,
}: ButtonProps) {
  const colorsFor = palette[variant];
  const inactive = disabled || pending;
  const shown = pending ? (pendingLabel ?? label) : label;

  const look = ({ pressed, focused, hovered }: PressState): StyleProp<ViewStyle> => [
    styles.base,
    fullWidth && styles.fullWidth,
    {
      backgroundColor: (pressed || hovered) && !inactive ? colorsFor.pressed : colorsFor.ground,
      borderColor: colorsFor.border,
    },
    inactive && styles.inactive,
    focused && styles.focused,
    style,
  ];
  const content = (
    <View style={styles.content}>
      {pending ? <ActivityIndicator size="small" color={colorsFor.text} /> : Icon ? <Icon size={22} color={colorsFor.text} /> : null}
      <Text variant="label" style={{ color: colorsFor.text }}>
        {shown}
      </Text>
    </View>
  );

  if (href && !inactive) {
    return (
      <LinkPressable href={href} accessibilityLabel={accessibilityLabel} testID={testID} style={look}>
        {content}
      </LinkPressable>
    );
  }
  return (
    <Pressable
      role="button"
      accessibilityLabel={accessibilityLabel}
      aria-disabled={inactive}
      aria-busy={pending}
      disabled={inactive}
      onPress={inactive ? undefined : onPress}
      testID={testID}
      style={(state) => look(state as PressState)}
    >
      {content}
    </Pressable>
  );
}

const styles = StyleSheet.create({
  base: {
    minHeight: layout.minTap,
    minWidth: layout.minTap,
    paddingHorizontal: space.xl - space.xs,
    paddingVertical: space.sm,
    borderRadius: radii.md,
    borderWidth: borders.control,
    justifyContent: 'center',
    alignItems: 'center',
    alignSelf: 'flex-start',
  },
  fullWidth: { alignSelf: 'stretch' },
  content: { flexDirection: 'row', alignItems: 'center', gap: space.sm },
  inactive: { opacity: 0.6 },
  focused: { outlineColor: colors.focus, outlineStyle: 'solid', outlineWidth: borders.focus, outlineOffset: 2 },
});
