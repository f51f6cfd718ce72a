import type { ReactNode } from 'react';
import { ScrollView, StyleSheet, View, type StyleProp, type ViewStyle } from 'react-native';

import { useWide } from '@/components/ui/use-wide';
import { layout, space } from '@/components/theme';

export interface ScreenProps {
  children: ReactNode;
  /** "content" caps at 1040 px (default); "form" caps at 440 px for single forms. */
  width?: 'content' | 'form';
  /** Scroll the content (default true). Turn off for screens that manage their own scrolling. */
  scroll?: boolean;
  /** Centre the content vertically (empty or short screens). */
  centered?: boolean;
  testID?: string;
  style?: StyleProp<ViewStyle>;
}

/**
 * A screen's body: a scrolling paper ground with a centred, width-capped column.
 * Example: `<Screen><SectionHeading level={1} title="Account" /></Screen>`
 */
export function Screen({ children, width = 'content', scroll = true, centered = false, testID, style }: ScreenProps) {
  const wide = useWide();
  const padded = [styles.padded, wide && styles.paddedWide];
  const column = (
    <View style={[styles.column, { maxWidth: width === 'form' ? layout.formMax : layout.contentMax }, style]}>{children}</View>
  );
  if (!scroll) {
    return (
      <View testID={testID} style={[styles.fill, ...padded, centered && styles.centered]}>
        {column}
      </View>
    );
  }
  return (
    <ScrollView
      testID={testID}
      style={styles.fill}
      contentContainerStyle={[...padded, centered && styles.centered, centered && styles.grow]}
      keyboardShouldPersistTaps="handled"
    >
      {column}
    </ScrollView>
  );
}

const styles = StyleSheet.create({
  fill: { flex: 1 },
  grow: { flexGrow: 1 },
  padded: { paddingHorizontal: space.lg, paddingTop: space.xl, paddingBottom: space.xxxl, alignItems: 'center' },
  paddedWide: { paddingHorizontal: space.xxl, paddingTop: space.xxl },
  centered: { justifyContent: 'center' },
  column: { width: '100%', gap: space.xl },
});
