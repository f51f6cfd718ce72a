import { StyleSheet, View } from 'react-native';

import { sightInWords, tapeWords } from '@/components/bows/readiness-words';
import { Card } from '@/components/ui/card';
import { ChevronRightIcon } from '@/components/ui/icons';
import { ReadinessBadge } from '@/components/ui/readiness-badge';
import { Text } from '@/components/ui/text';
import { colors, space } from '@/components/theme';
import type { BowSummary } from '@/shared/bow';
import { levelSummarySchema } from '@/shared/level-summary';

const count = (n: number, one: string, many: string) => `${n} ${n === 1 ? one : many}`;

/**
 * One bow on the home screen: nickname, level readiness in words, and how far its
 * records go (builds, sight-ins, a saved tape). Opens the bow.
 * Example: `<BowCard bow={summary} />`
 */
export function BowCard({ bow }: { bow: BowSummary }) {
  const level = levelSummarySchema.safeParse(bow.readiness.level);
  const state = level.success ? level.data.state : 'none';
  // Fit quality of the latest sight-in and whether a tape is saved (words shared with the Bow screen).
  const sightIn = sightInWords(bow.readiness);
  const tape = tapeWords(bow.readiness);
  const records = [count(bow.readiness.buildCount, 'build', 'builds'), count(bow.readiness.sightInCount, 'sight-in', 'sight-ins')].join(
    ' · ',
  );
  return (
    <Card href={`/bows/${bow.id}`} accessibilityLabel={`Open ${bow.nickname}`} testID={`bow-card-${bow.id}`}>
      <View style={styles.row}>
        <View style={styles.words}>
          <Text variant="title" numberOfLines={1}>
            {bow.nickname}
          </Text>
          <View style={styles.badges}>
            <ReadinessBadge state={sightIn.state} label={sightIn.label} subject="Sight-in" />
            <ReadinessBadge state={tape.state} label={tape.label} subject="Tape" />
            <ReadinessBadge state={state} subject="Level" />
          </View>
          {bow.readiness.confirm ? (
            <Text variant="small" tone="due" testID={`bow-card-${bow.id}-confirm`}>
              {bow.readiness.confirm.reason}
            </Text>
          ) : null}
          {level.success && level.data.reason ? (
            <Text variant="small" testID={`bow-card-${bow.id}-level-reason`}>
              {level.data.reason}
            </Text>
          ) : null}
          <Text variant="small" tone="soft">
            {records}
          </Text>
        </View>
        <ChevronRightIcon size={28} color={colors.inkSoft} />
      </View>
    </Card>
  );
}

const styles = StyleSheet.create({
  row: { flexDirection: 'row', alignItems: 'center', gap: space.md },
  words: { flex: 1, gap: space.sm },
  badges: { flexDirection: 'row', flexWrap: 'wrap', gap: space.sm },
});
