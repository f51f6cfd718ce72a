import type { ReactNode } from 'react';
import { StyleSheet, Text as NativeText, type StyleProp, type TextProps as NativeTextProps, type TextStyle } from 'react-native';

import { colors, type } from '@/components/theme';

export type TextVariant = keyof typeof type;
export type TextTone = 'default' | 'soft' | 'signal' | 'onSlate' | 'onSlateMuted' | 'failed' | 'verified' | 'due';

export interface TextProps extends Omit<NativeTextProps, 'style'> {
  /** Step of the type scale (theme.type). Default "body". */
  variant?: TextVariant;
  /** Colour role. Default "default" (ink). */
  tone?: TextTone;
  style?: StyleProp<TextStyle>;
  children?: ReactNode;
}

const toneColors: Record<TextTone, string> = {
  default: colors.ink,
  soft: colors.inkSoft,
  signal: colors.signal,
  onSlate: colors.onSlate,
  onSlateMuted: colors.onSlateMuted,
  failed: colors.failed,
  verified: colors.verified,
  due: colors.due,
};

/**
 * Text in Pinwright's type scale. Headings get role "heading" from the caller
 * (`role="heading" aria-level={2}`) or from SectionHeading.
 * Example: `<Text variant="title">Bench</Text>`
 */
export function Text({ variant = 'body', tone = 'default', style, ...rest }: TextProps) {
  return <NativeText {...rest} style={[styles.base, type[variant], { color: toneColors[tone] }, style]} />;
}

const styles = StyleSheet.create({
  base: { color: colors.ink },
});
