import type { ReactNode } from 'react';
import { StyleSheet, View } from 'react-native';

import { Text } from '@/components/ui/text';
import { borders, colors, radii, space } from '@/components/theme';

export interface EmptyStateProps {
  title: string;
  message: string;
  /** The clear next step, usually a primary Button. */
  action?: ReactNode;
  /** A picture above the title (e.g. a large icon). */
  art?: ReactNode;
  testID?: string;
}

/**
 * What a list shows when it has nothing yet, with the next step.
 * Example: `<EmptyState title="No bows yet" message="…" action={<Button label="Add your first bow" href="/bows/new" />} />`
 */
export function EmptyState({ title, message, action, art, testID }: EmptyStateProps) {
  return (
    <View testID={testID} style={styles.box}>
      {art}
      <Text variant="title" role="heading" aria-level={2} style={styles.center}>
        {title}
      </Text>
      <Text tone="soft" style={[styles.center, styles.message]}>
        {message}
      </Text>
      {action ? <View style={styles.action}>{action}</View> : null}
    </View>
  );
}

const styles = StyleSheet.create({
  box: {
    alignItems: 'center',
    gap: space.sm,
    paddingVertical: space.xxl,
    paddingHorizontal: space.xl,
    borderRadius: radii.lg,
    borderWidth: borders.control,
    borderStyle: 'dashed',
    borderColor: colors.lineStrong,
    backgroundColor: colors.surface,
  },
  center: { textAlign: 'center' },
  message: { maxWidth: 460 },
  action: { marginTop: space.md },
});
