import { useQueryClient } from '@tanstack/react-query';
import { useCallback, useState, useSyncExternalStore } from 'react';
import { ScrollView, StyleSheet, View } from 'react-native';

import { OutboxPanel, seenAt } from '@/components/offline/outbox-panel';
import { useOutbox } from '@/components/offline/use-outbox';
import { useOnline } from '@/components/offline/use-online';
import { Button } from '@/components/ui/button';
import { Text } from '@/components/ui/text';
import { borders, colors, space } from '@/components/theme';

/** When the newest record in the cache was fetched (ms since 1970), or null with nothing cached. */
function useLastSeen(): number | null {
  const queryClient = useQueryClient();
  const newest = () => {
    let most = 0;
    for (const query of queryClient.getQueryCache().getAll()) {
      if (query.state.data !== undefined && query.queryKey[0] !== 'me') most = Math.max(most, query.state.dataUpdatedAt);
    }
    return most > 0 ? most : null;
  };
  // The query cache is an outside store: read it where React can see each change.
  const subscribe = useCallback((changed: () => void) => queryClient.getQueryCache().subscribe(changed), [queryClient]);
  return useSyncExternalStore(subscribe, newest, newest);
}

/**
 * Above every screen: while the server cannot be reached, "Offline — showing
 * what this phone last saw, at <time>"; and whenever writes are kept on the
 * phone, the outbox (waiting and refused items). Nothing otherwise.
 * Example: `<OfflineNotice />`
 */
export function OfflineNotice() {
  const online = useOnline();
  const seen = useLastSeen();
  const items = useOutbox();
  const [open, setOpen] = useState<boolean | null>(null);
  if (online && items.length === 0) return null;
  // Open by default while the list is short or something was refused; the archer may fold it.
  const expanded = open ?? (items.length <= 3 || items.some((item) => item.state === 'refused'));
  return (
    <View style={styles.strip} testID="offline-strip">
      {!online ? (
        <View role="status" aria-live="polite" testID="offline-notice">
          <Text variant="label">
            {seen ? `Offline — showing what this phone last saw, ${seenAt(seen)}.` : 'Offline — this phone has nothing saved to show yet.'}
          </Text>
          <Text variant="small" tone="soft">
            What you enter is kept here and sent when the signal is back. Downloads (PDF) need a connection.
          </Text>
        </View>
      ) : null}
      {items.length > 0 ? (
        <>
          {items.length > 3 || !expanded ? (
            <Button
              label={expanded ? 'Hide the list' : `Show what is kept on this phone (${items.length})`}
              variant="quiet"
              onPress={() => setOpen(!expanded)}
              testID="outbox-toggle"
            />
          ) : null}
          {expanded ? (
            <ScrollView style={styles.list}>
              <OutboxPanel />
            </ScrollView>
          ) : null}
        </>
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  strip: {
    gap: space.sm,
    paddingHorizontal: space.lg,
    paddingVertical: space.sm,
    backgroundColor: colors.dueTint,
    borderBottomWidth: borders.focus,
    borderBottomColor: colors.due,
  },
  list: { maxHeight: 360 },
});
