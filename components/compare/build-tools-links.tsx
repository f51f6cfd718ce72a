import { StyleSheet, View } from 'react-native';

import { Button } from '@/components/ui/button';
import { space } from '@/components/theme';

/**
 * The bow screen's ways to its build tools: compare builds side by side (from
 * two builds on) and predict a build not shot yet.
 * Example: `<BuildToolsLinks bowId={3} buildCount={2} />`
 */
export function BuildToolsLinks({ bowId, buildCount }: { bowId: number; buildCount: number }) {
  if (buildCount === 0) return null;
  return (
    <View style={styles.row}>
      {buildCount >= 2 ? <Button label="Compare builds" variant="secondary" href={`/bows/${bowId}/compare`} testID="open-compare" /> : null}
      <Button label="Predict a build" variant="quiet" href={`/bows/${bowId}/predict`} testID="open-predict" />
    </View>
  );
}

const styles = StyleSheet.create({
  row: { flexDirection: 'row', flexWrap: 'wrap', gap: space.sm, alignItems: 'center' },
});
