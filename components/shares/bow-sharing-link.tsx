import { StyleSheet, View } from 'react-native';

import { useMe } from '@/components/auth/api';
import { Banner } from '@/components/ui/banner';
import { Button } from '@/components/ui/button';
import { space } from '@/components/theme';

export interface BowSharingLinkProps {
  bowId: number;
  /** The bow's owner (BowDetail.userId). */
  ownerId: number;
}

/**
 * On a bow's screen: for its archer, the way to sharing, the log and exports;
 * for a technician it is shared with, what they may do here.
 * Example: `<BowSharingLink bowId={bow.id} ownerId={bow.userId} />`
 */
export function BowSharingLink({ bowId, ownerId }: BowSharingLinkProps) {
  const me = useMe();
  if (!me.data) return null;
  if (me.data.id === ownerId) {
    return (
      <View style={styles.row}>
        <Button label="Share, log and export" variant="secondary" href={`/bows/${bowId}/sharing`} testID="open-sharing" />
      </View>
    );
  }
  return (
    <Banner
      tone="info"
      title="Shared with you"
      testID="shared-with-you"
      action={<Button label="Export the records" variant="quiet" href={`/bows/${bowId}/sharing`} />}
    >
      You can add sight-in sessions, marks, level checks and change notes. Deleting or changing the archer’s own records is theirs alone, and the archer sees everything you add.
    </Banner>
  );
}

const styles = StyleSheet.create({
  row: { flexDirection: 'row', flexWrap: 'wrap', gap: space.sm },
});
