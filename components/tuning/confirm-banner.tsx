import { StyleSheet, View } from 'react-native';

import { formatDay } from '@/components/bows/readiness-words';
import { useConfirmAtRange, useSightInStaleness } from '@/components/tuning/api';
import { Banner } from '@/components/ui/banner';
import { Button } from '@/components/ui/button';
import { Text } from '@/components/ui/text';
import { space } from '@/components/theme';

/**
 * "Confirm at the range" for a sight-in and the tapes printed from it, when a
 * change that moves the point of impact came after it (shared/staleness.ts),
 * with the reason and date, and the action that records the marks as
 * confirmed. Nothing when current (a line naming the last confirmation, if any).
 * Example: `<ConfirmAtRangeBanner sightInId={8} subject="tape" />`
 */
export function ConfirmAtRangeBanner({ sightInId, subject }: { sightInId: number; subject: 'sight-in' | 'tape' }) {
  const staleness = useSightInStaleness(sightInId);
  const confirm = useConfirmAtRange(sightInId);
  if (!staleness.data) return null;
  const last = staleness.data.confirmations[staleness.data.confirmations.length - 1];
  if (staleness.data.state === 'current') {
    return last ? (
      <Text variant="small" tone="verified" testID="range-confirmed">
        Marks confirmed at the range {formatDay(last.confirmedAt)} by {last.confirmedBy.name}
        {last.note ? ` · ${last.note}` : ''}.
      </Text>
    ) : null;
  }
  return (
    <Banner
      tone="warn"
      title={subject === 'tape' ? 'Confirm this tape at the range' : 'Confirm these marks at the range'}
      testID="confirm-at-range"
      action={
        staleness.data.canConfirm ? (
          <View style={styles.actions}>
            <Button
              label="Marks confirmed at the range"
              variant="secondary"
              pendingLabel="Saving…"
              pending={confirm.isPending}
              onPress={() => confirm.mutate({ note: '' })}
              testID="confirm-range"
            />
            {confirm.isError ? <Text tone="failed">{confirm.error.message}</Text> : null}
          </View>
        ) : undefined
      }
    >
      {`${staleness.data.reason} Shoot a long and a short distance; if they land, record it here. A new sight-in replaces these marks.`}
    </Banner>
  );
}

const styles = StyleSheet.create({ actions: { gap: space.sm } });
