import { ActivityIndicator, StyleSheet, View } from 'react-native';

import { Text } from '@/components/ui/text';
import { colors, space } from '@/components/theme';

/**
 * A centred spinner with words, for pending screens.
 * Example: `if (bows.isPending) return <LoadingView label="Loading your bench…" />;`
 */
export function LoadingView({ label = 'Loading…' }: { label?: string }) {
  return (
    <View style={styles.box} role="status" aria-live="polite">
      <ActivityIndicator size="large" color={colors.signal} />
      <Text tone="soft">{label}</Text>
    </View>
  );
}

const styles = StyleSheet.create({
  box: { flex: 1, alignItems: 'center', justifyContent: 'center', gap: space.md, padding: space.xl },
});
