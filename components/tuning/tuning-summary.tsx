import { StyleSheet, View } from 'react-native';

import { KeyValueList } from '@/components/bows/key-value-list';
import { formatDay } from '@/components/bows/readiness-words';
import { useSetup } from '@/components/tuning/api';
import { Text } from '@/components/ui/text';
import { TextLink } from '@/components/ui/text-link';
import { space } from '@/components/theme';
import type { LengthUnit } from '@/shared/auth';
import { setupMeasureKeys, setupMeasures, setupValueWords } from '@/shared/setup-measures';

/**
 * The latest tuning set-up entries of a bow, as label / value rows (who added
 * an entry when it was not the archer), with the way to the tuning screen.
 * Example: `<TuningSummary bowId={3} unit="in" />`
 */
export function TuningSummary({ bowId, unit }: { bowId: number; unit: LengthUnit }) {
  const setup = useSetup(bowId);
  const latest = setup.data?.latest ?? {};
  const items = setupMeasureKeys
    .filter((measure) => latest[measure])
    .map((measure) => {
      const entry = latest[measure];
      return {
        label: setupMeasures[measure].name,
        value: `${setupValueWords(entry, unit)} · ${formatDay(entry.measuredOn)}${entry.byTechnician ? ` · by ${entry.addedBy.name}` : ''}`,
      };
    });
  return (
    <View style={styles.wrap} testID="tuning-summary">
      <Text variant="label">Tuning</Text>
      {items.length > 0 ? (
        <KeyValueList items={items} />
      ) : (
        <Text tone="soft">{setup.isPending ? 'Loading…' : 'No tuning measures recorded yet.'}</Text>
      )}
      <TextLink href={`/bows/${bowId}/tuning`} label="Tuning, paper tune and arrow sets" testID="tuning-summary-link" />
    </View>
  );
}

const styles = StyleSheet.create({ wrap: { gap: space.sm } });
