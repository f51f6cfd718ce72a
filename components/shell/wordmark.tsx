import { StyleSheet, View } from 'react-native';

import { Mark } from '@/components/shell/mark';
import { Text } from '@/components/ui/text';
import { colors, fonts, space } from '@/components/theme';

export interface WordmarkProps {
  /** "onSlate" for the dark bars, "ink" for paper grounds. Default "onSlate". */
  tone?: 'onSlate' | 'ink';
  /** Height of the mark in px; the name scales with it. Default 28. */
  size?: number;
}

/**
 * The mark followed by the name "Pinwright".
 * Example: `<Wordmark tone="ink" size={36} />`
 */
export function Wordmark({ tone = 'onSlate', size = 28 }: WordmarkProps) {
  const ink = tone === 'onSlate' ? colors.onSlate : colors.ink;
  const accent = tone === 'onSlate' ? colors.signalOnSlate : colors.signal;
  return (
    <View style={styles.row} accessibilityLabel="Pinwright" role="img">
      <Mark size={size} color={ink} accent={accent} />
      <Text style={[styles.name, { color: ink, fontSize: Math.round(size * 0.82), lineHeight: Math.round(size * 1.05) }]} aria-hidden>
        Pinwright
      </Text>
    </View>
  );
}

const styles = StyleSheet.create({
  row: { flexDirection: 'row', alignItems: 'center', gap: space.sm },
  name: { fontFamily: fonts.bold, letterSpacing: 0.3 },
});
