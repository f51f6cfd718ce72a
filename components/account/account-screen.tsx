import { StyleSheet, View } from 'react-native';

import { AccountDetails } from '@/components/account/account-details';
import { AccountShares } from '@/components/shares/account-shares';
import { UnitChoices } from '@/components/account/unit-choices';
import { useMe, useSignOut } from '@/components/auth/api';
import { Banner } from '@/components/ui/banner';
import { Button } from '@/components/ui/button';
import { Card } from '@/components/ui/card';
import { SignOutIcon } from '@/components/ui/icons';
import { LoadingView } from '@/components/ui/loading-view';
import { Screen } from '@/components/ui/screen';
import { ScreenTitle } from '@/components/ui/screen-title';
import { SectionHeading } from '@/components/ui/section-heading';
import { space } from '@/components/theme';

/** The account page: who is signed in, their units, and signing out. */
export function AccountScreen() {
  const me = useMe();
  const signOut = useSignOut();

  // The (app) layout only renders this once useMe has a user; this covers the moment after sign-out.
  if (!me.data) return <LoadingView />;

  return (
    <Screen>
      <ScreenTitle name="Account" />
      <SectionHeading level={1} title="Account" description="Who is signed in on this device." />
      <Card>
        <AccountDetails user={me.data} />
      </Card>
      <SectionHeading level={2} title="Units" description="How Pinwright shows distances and lengths to you." />
      <Card>
        <UnitChoices user={me.data} />
      </Card>
      <AccountShares />
      {signOut.isError ? (
        <Banner tone="error" title="Could not sign out">
          {signOut.error.message}
        </Banner>
      ) : null}
      <View style={styles.actions}>
        <Button
          label="Sign out"
          pendingLabel="Signing out…"
          pending={signOut.isPending}
          variant="secondary"
          icon={SignOutIcon}
          onPress={() => signOut.mutate()}
        />
      </View>
    </Screen>
  );
}

const styles = StyleSheet.create({
  actions: { flexDirection: 'row', gap: space.md },
});
