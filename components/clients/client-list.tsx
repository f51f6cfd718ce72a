import { StyleSheet, View } from 'react-native';

import { useClients } from '@/components/clients/api';
import { Card } from '@/components/ui/card';
import { EmptyState } from '@/components/ui/empty-state';
import { ErrorView } from '@/components/ui/error-view';
import { ChevronRightIcon } from '@/components/ui/icons';
import { LoadingView } from '@/components/ui/loading-view';
import { SectionHeading } from '@/components/ui/section-heading';
import { Text } from '@/components/ui/text';
import { useWide } from '@/components/ui/use-wide';
import { colors, space } from '@/components/theme';

const sightWords: Record<string, string> = {
  'single-pin-slider': 'Single-pin slider',
  'fixed-multi-pin': 'Fixed multi-pin',
  hybrid: 'Hybrid',
};

const day = (iso: string) => new Date(iso).toLocaleDateString(undefined, { dateStyle: 'medium' });

/**
 * A technician's clients: each archer who shares bows with them, with those
 * bows (a card each, opening the bow). A share the archer ends disappears at
 * once. Used by the Clients screen and by a technician's Bench.
 * Example: `<ClientList headingLevel={2} />`
 */
export function ClientList({ headingLevel = 2 }: { headingLevel?: 2 | 3 }) {
  const clients = useClients();
  const wide = useWide();
  if (clients.isPending) return <LoadingView label="Loading your clients…" />;
  if (clients.isError) {
    return (
      <ErrorView
        title="Your clients could not be loaded"
        error={clients.error}
        onRetry={() => clients.refetch()}
        retrying={clients.isFetching}
      />
    );
  }
  if (clients.data.length === 0) {
    return (
      <EmptyState
        testID="clients-empty"
        title="No shared bows yet"
        message="When an archer shares a bow with your address, the e-mail has a link to accept; the bow then appears here, with its builds, sight-ins and level checks."
      />
    );
  }
  return (
    <View style={[styles.grid, wide && styles.gridWide]}>
      {clients.data.map((client) => (
        <View key={client.archer.id} style={[styles.client, wide && styles.clientWide]} testID={`client-${client.archer.id}`}>
          <SectionHeading title={client.archer.name} description={client.archer.email} level={headingLevel} />
          {client.bows.map((bow) => (
            <Card
              key={bow.id}
              href={`/bows/${bow.id}`}
              accessibilityLabel={`Open ${bow.nickname}, shared by ${client.archer.name}`}
              testID={`client-bow-${bow.id}`}
            >
              <View style={styles.bowRow}>
                <View style={styles.bowWords}>
                  <Text variant="title">{bow.nickname}</Text>
                  <Text variant="small" tone="soft">
                    {`${sightWords[bow.sightKind] ?? bow.sightKind} · shared since ${day(bow.sharedSince)}`}
                  </Text>
                </View>
                <ChevronRightIcon color={colors.inkSoft} />
              </View>
            </Card>
          ))}
        </View>
      ))}
    </View>
  );
}

const styles = StyleSheet.create({
  grid: { gap: space.xl },
  gridWide: { flexDirection: 'row', flexWrap: 'wrap' },
  client: { gap: space.sm },
  clientWide: { flexBasis: 420, flexGrow: 1 },
  bowRow: { flexDirection: 'row', alignItems: 'center', gap: space.md },
  bowWords: { flex: 1, gap: space.xxs },
});
