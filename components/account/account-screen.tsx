import { StyleSheet, View } from 'react-native';

import { AccountDetails } from '@/components/account/account-details';
import { accountExportHref } from '@/components/account/api';
import { DeleteAccount } from '@/components/account/delete-account';
import { PasswordChangeForm } from '@/components/account/password-change-form';
import { AccountShares } from '@/components/shares/account-shares';
import { UnitChoices } from '@/components/account/unit-choices';
import { useMe } from '@/components/auth/api';
import { SignOutButton } from '@/components/auth/sign-out-button';
import { Card } from '@/components/ui/card';
import { DownloadLink } from '@/components/ui/download-link';
import { SignOutIcon } from '@/components/ui/icons';
import { LoadingView } from '@/components/ui/loading-view';
import { Screen } from '@/components/ui/screen';
import { ScreenTitle } from '@/components/ui/screen-title';
import { SectionHeading } from '@/components/ui/section-heading';
import { Text } from '@/components/ui/text';
import { space } from '@/components/theme';

/** The account page: who is signed in, their units, shares, password, a download of everything, signing out and deleting the account. */
export function AccountScreen() {
  const me = useMe();

  // The (app) layout only renders this once useMe has a user; this covers the moment after sign-out.
  if (!me.data) return <LoadingView />;

  return (
    <Screen>
      <ScreenTitle name="Account" />
      <SectionHeading level={1} title="Account" description="Who is signed in on this device." />
      <Card>
        <AccountDetails user={me.data} />
      </Card>
      <SectionHeading
        level={2}
        title="Units"
        description="How Pinwright shows and takes measurements. Records are kept in one unit underneath, so changing these changes no record."
      />
      <Card>
        <UnitChoices user={me.data} />
      </Card>
      <AccountShares />
      <SectionHeading level={2} title="Password" />
      <Card>
        <PasswordChangeForm />
      </Card>
      <SectionHeading level={2} title="Your records" />
      <Card style={styles.card}>
        <Text tone="soft">Every bow with its builds, sight-ins, marks, tapes, level checks and changes, in one JSON file.</Text>
        <View style={styles.actions}>
          <DownloadLink label="Download everything" href={accountExportHref} fileName="pinwright-everything.json" testID="account-export" />
        </View>
      </Card>
      <SignOutButton label="Sign out" variant="secondary" icon={SignOutIcon} />
      <SectionHeading level={2} title="Delete the account" />
      <Card>
        <DeleteAccount />
      </Card>
    </Screen>
  );
}

const styles = StyleSheet.create({
  actions: { flexDirection: 'row', flexWrap: 'wrap', gap: space.md },
  card: { gap: space.md },
});
