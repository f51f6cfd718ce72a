import type { ReactNode } from 'react';
import { StyleSheet, View } from 'react-native';

import { Text } from '@/components/ui/text';
import { space } from '@/components/theme';

export interface SectionHeadingProps {
  title: string;
  /** One line under the title. */
  description?: string;
  /** Content on the right (e.g. a small Button); wraps under the title on narrow screens. */
  action?: ReactNode;
  /** Heading level for screen readers; 1 for a screen's title. Default 2. */
  level?: 1 | 2 | 3;
}

/**
 * A heading with an optional description and action.
 * Example: `<SectionHeading level={1} title="Bench" description="Your bows and their readiness" />`
 */
export function SectionHeading({ title, description, action, level = 2 }: SectionHeadingProps) {
  return (
    <View style={styles.row}>
      <View style={styles.words}>
        <Text role="heading" aria-level={level} variant={level === 1 ? 'heading' : level === 2 ? 'title' : 'label'}>
          {title}
        </Text>
        {description ? (
          <Text variant="small" tone="soft">
            {description}
          </Text>
        ) : null}
      </View>
      {action ? <View style={styles.action}>{action}</View> : null}
    </View>
  );
}

const styles = StyleSheet.create({
  row: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'flex-end', justifyContent: 'space-between', gap: space.md },
  words: { flexGrow: 1, flexShrink: 1, flexBasis: 240, gap: space.xxs },
  action: { flexShrink: 0 },
});
