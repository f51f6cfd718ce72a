import { StyleSheet, View } from 'react-native';

import { useMe } from '@/components/auth/api';
import { useMyShares } from '@/components/shares/api';
import { ShareStateBadge } from '@/components/shares/share-state-badge';
import { Button } from '@/components/ui/button';
import { Card } from '@/components/ui/card';
import { SectionHeading } from '@/components/ui/section-heading';
import { Text } from '@/components/ui/text';
import { space } from '@/components/theme';

/**
 * The Account page's sharing section: for an archer, every bow shared or
 * offered to a technician (each links to that bow's sharing page); for a
 * technician, the way to Clients.
 * Example: `<AccountShares />`
 */
export function AccountShares() {
  const me = useMe();
  const isTech = me.data?.role === 'tech';
  const shares = useMyShares(!isTech && Boolean(me.data));
  if (!me.data) return null;
  if (isTech) {
    return (
      <Card>
        <SectionHeading title="Shared with you" level={2} description="The bows archers share with you are under Clients." />
        <View style={styles.row}>
          <Button label="Open Clients" variant="secondary" href="/clients" />
        </View>
      </Card>
    );
  }
  return (
    <Card testID="account-shares">
      <SectionHeading
        title="Sharing"
        level={2}
        description="Bows you share with a technician. Share a bow from its page: Share, log and export."
      />
      {shares.isError ? <Text tone="failed">{shares.error.message}</Text> : null}
      {shares.data && shares.data.length === 0 ? <Text tone="soft">You share no bows. Your records are yours alone.</Text> : null}
      {shares.data?.map((share) => (
        <View key={share.id} style={styles.share}>
          <View style={styles.words}>
            <Text variant="label">{share.bowNickname}</Text>
            <Text variant="small" tone="soft">
              {share.tech ? `${share.tech.name} (${share.tech.email})` : share.invitedEmail}
            </Text>
          </View>
          <ShareStateBadge state={share.state} />
          <Button label="Manage" variant="quiet" href={`/bows/${share.bowId}/sharing`} />
        </View>
      ))}
    </Card>
  );
}

const styles = StyleSheet.create({
  row: { flexDirection: 'row', gap: space.sm },
  share: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'center', gap: space.sm },
  words: { flexGrow: 1, flexShrink: 1, flexBasis: 200 },
});
