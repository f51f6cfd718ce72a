import { StyleSheet, View } from 'react-native';

import type { BenchBow } from '@/components/bench/api';
import { Card } from '@/components/ui/card';
import { ChevronRightIcon } from '@/components/ui/icons';
import { ReadinessBadge } from '@/components/ui/readiness-badge';
import { Text } from '@/components/ui/text';
import { colors, space } from '@/components/theme';

/**
 * One bow on the bench: its nickname and level readiness; opens the bow.
 * Example: `<BowCard bow={{ id: 3, nickname: 'Ridge Runner', levelStatus: 'due' }} />`
 */
export function BowCard({ bow }: { bow: BenchBow }) {
  return (
    <Card href={`/bows/${bow.id}`} accessibilityLabel={`Open ${bow.nickname}`} testID={`bow-card-${bow.id}`}>
      <View style={styles.row}>
        <View style={styles.words}>
          <Text variant="title" numberOfLines={1}>
            {bow.nickname}
          </Text>
          <ReadinessBadge state={bow.levelStatus ?? 'none'} subject="Level" />
        </View>
        <ChevronRightIcon size={28} color={colors.inkSoft} />
      </View>
    </Card>
  );
}

const styles = StyleSheet.create({
  row: { flexDirection: 'row', alignItems: 'center', gap: space.md },
  words: { flex: 1, gap: space.sm },
});
