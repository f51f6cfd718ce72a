import { useDeferredValue, useState } from 'react';
import { StyleSheet, View } from 'react-native';

import { useMe } from '@/components/auth/api';
import { useHomeBows } from '@/components/home/api';
import { HomeArt } from '@/components/home/home-art';
import { BowCard } from '@/components/home/bow-card';
import { ClientList } from '@/components/clients/client-list';
import { loadTryCarry } from '@/components/try/try-carry';
import { Banner } from '@/components/ui/banner';
import { Button } from '@/components/ui/button';
import { EmptyState } from '@/components/ui/empty-state';
import { ErrorView } from '@/components/ui/error-view';
import { PlusIcon } from '@/components/ui/icons';
import { LoadingView } from '@/components/ui/loading-view';
import { Screen } from '@/components/ui/screen';
import { ScreenTitle } from '@/components/ui/screen-title';
import { SectionHeading } from '@/components/ui/section-heading';
import { useWide } from '@/components/ui/use-wide';
import { space } from '@/components/theme';

const title = <ScreenTitle name="Bench" />;

/**
 * The home screen (its visible name is "Bench", the product's word for it; the
 * code says "home" so it is not confused with the bench level check or the
 * benchmarks): the archer's bows with their readiness, or the first step when
 * there are none. A technician's home is their clients and the bows shared
 * with them (and their own bows, if they keep any, below).
 */
export function HomeScreen() {
  const bows = useHomeBows();
  const me = useMe();
  const wide = useWide();
  const [carried] = useState(loadTryCarry);
  // Bows that arrive after the page is up are drawn in slices, not one block (see app/(app)/_layout.tsx).
  const loaded = useDeferredValue(!bows.isPending);

  if (bows.isPending || !loaded) {
    return (
      <>
        {title}
        <LoadingView label="Loading your bench…" />
      </>
    );
  }
  if (bows.isError) {
    return (
      <>
        {title}
        <ErrorView title="Your bench could not be loaded" error={bows.error} onRetry={() => bows.refetch()} retrying={bows.isFetching} />
      </>
    );
  }

  const list = bows.data;
  if (me.data?.role === 'tech') {
    return (
      <Screen testID="tech-bench">
        {title}
        <SectionHeading
          level={1}
          title="Bench"
          description="The bows archers share with you. Open one to read its records and add a build, a sight-in, marks, a level check or a change: each is shown to the archer as yours."
        />
        <ClientList />
        {list.length > 0 ? (
          <>
            <SectionHeading
              level={2}
              title="Your own bows"
              action={<Button label="Add a bow" icon={PlusIcon} variant="quiet" href="/bows/new" />}
            />
            <View style={[styles.grid, wide && styles.gridWide]}>
              {list.map((bow) => (
                <View key={bow.id} style={wide ? styles.cellWide : styles.cell}>
                  <BowCard bow={bow} />
                </View>
              ))}
            </View>
          </>
        ) : null}
      </Screen>
    );
  }
  return (
    <Screen>
      {title}
      <SectionHeading
        level={1}
        title="Bench"
        description={list.length ? 'Your bows and whether each is ready to shoot.' : undefined}
        action={list.length ? <Button label="Add a bow" icon={PlusIcon} variant="secondary" href="/bows/new" /> : null}
      />
      {list.length === 0 && carried ? (
        <Banner
          tone="info"
          title="Keep the tape you tried"
          testID="bench-keep-try"
          action={<Button label="Make it my first bow" href="/keep-try" testID="bench-keep-try-open" />}
        >
          {`The two marks you typed on the try page (${carried.nearDistance} ${carried.distanceUnit} at ${carried.nearReading} mm, ${carried.farDistance} ${carried.distanceUnit} at ${carried.farReading} mm) can become your first bow and its first sight-in.`}
        </Banner>
      ) : null}
      {list.length === 0 ? (
        <EmptyState
          testID="bench-empty"
          art={<HomeArt />}
          title="No bows on your bench yet"
          message="Add a bow with its draw, sight and peep measurements. Then record an arrow build and sight in a few distances to fit a tape."
          action={<Button label="Add your first bow" icon={PlusIcon} href="/bows/new" />}
        />
      ) : (
        <View style={[styles.grid, wide && styles.gridWide]}>
          {list.map((bow) => (
            <View key={bow.id} style={wide ? styles.cellWide : styles.cell}>
              <BowCard bow={bow} />
            </View>
          ))}
        </View>
      )}
    </Screen>
  );
}

const styles = StyleSheet.create({
  grid: { gap: space.md },
  gridWide: { flexDirection: 'row', flexWrap: 'wrap' },
  cell: { alignSelf: 'stretch' },
  cellWide: { flexBasis: '48%', flexGrow: 1 },
});
