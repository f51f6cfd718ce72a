import type { ReactElement, ReactNode } from 'react';
import { StyleSheet, View, type StyleProp, type ViewStyle } from 'react-native';

import { ErrorIcon, InfoIcon, WarningIcon, type IconProps } from '@/components/ui/icons';
import { Text } from '@/components/ui/text';
import { borders, colors, radii, space } from '@/components/theme';

/**
 * info = neutral note; warn = something to look at (e.g. a weak fit);
 * error = an action failed; caution = a safety caution (dark, cannot be mistaken for a status).
 */
export type BannerTone = 'info' | 'warn' | 'error' | 'caution';

export interface BannerProps {
  tone?: BannerTone;
  /** Bold first line. */
  title?: string;
  /** Body text (a string) or richer content. */
  children?: ReactNode;
  /** Optional action (e.g. a Button) shown under the text. */
  action?: ReactNode;
  testID?: string;
  style?: StyleProp<ViewStyle>;
}

const tones: Record<BannerTone, { ground: string; edge: string; text: string; icon: (props: IconProps) => ReactElement; word: string }> = {
  info: { ground: colors.infoTint, edge: colors.info, text: colors.ink, icon: InfoIcon, word: 'Note' },
  warn: { ground: colors.dueTint, edge: colors.due, text: colors.ink, icon: WarningIcon, word: 'Check' },
  error: { ground: colors.failedTint, edge: colors.failed, text: colors.ink, icon: ErrorIcon, word: 'Problem' },
  caution: {
    ground: colors.cautionGround,
    edge: colors.cautionAccent,
    text: colors.onCaution,
    icon: WarningIcon,
    word: 'Caution',
  },
};

/**
 * A message box with an icon, a thick edge in the tone's colour and, when no
 * title is given, the tone's word ("Caution", "Problem"…) so it never relies on colour alone.
 * Errors are announced (role "alert"); the rest are polite ("status").
 * Example: `<Banner tone="caution">Bow presses can injure…</Banner>`
 */
export function Banner({ tone = 'info', title, children, action, testID, style }: BannerProps) {
  const look = tones[tone];
  const Icon = look.icon;
  return (
    <View
      testID={testID}
      role={tone === 'error' ? 'alert' : 'status'}
      style={[styles.box, { backgroundColor: look.ground, borderLeftColor: look.edge }, style]}
    >
      <Icon size={24} color={look.edge} />
      <View style={styles.body}>
        <Text variant="label" style={{ color: look.text }}>
          {title ?? look.word}
        </Text>
        {typeof children === 'string' ? <Text style={{ color: look.text }}>{children}</Text> : children}
        {action ? <View style={styles.action}>{action}</View> : null}
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  box: {
    flexDirection: 'row',
    gap: space.md,
    alignItems: 'flex-start',
    padding: space.lg,
    borderRadius: radii.md,
    borderLeftWidth: borders.heavy + 2,
  },
  body: { flex: 1, gap: space.xs },
  action: { marginTop: space.sm },
});
