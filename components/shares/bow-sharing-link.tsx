import { StyleSheet, View } from 'react-native';

import { useBowRole } from '@/components/bows/use-bow-role';
import { Banner } from '@/components/ui/banner';
import { Button } from '@/components/ui/button';
import { space } from '@/components/theme';
import type { BowDetail } from '@/shared/bow-detail';

export interface BowSharingLinkProps {
  /** The bow: its id, owner (userId) and owner's name. */
  bow: Pick<BowDetail, 'id' | 'userId' | 'ownerName'>;
}

/**
 * On a bow's screen: for its archer, the way to sharing, the log and exports;
 * for a technician it is shared with, whose bow it is and what they may do here.
 * Example: `<BowSharingLink bow={bow} />`
 */
export function BowSharingLink({ bow }: BowSharingLinkProps) {
  const { isOwner, canAdd } = useBowRole(bow);
  if (!canAdd) return null;
  if (isOwner) {
    return (
      <View style={styles.row}>
        <Button label="Share, log and export" variant="secondary" href={`/bows/${bow.id}/sharing`} testID="open-sharing" />
      </View>
    );
  }
  const archer = bow.ownerName || 'the archer';
  return (
    <Banner
      tone="info"
      title={`Shared with you by ${archer}.`}
      testID="shared-with-you"
      action={<Button label="Export the records" variant="quiet" href={`/bows/${bow.id}/sharing`} />}
    >
      {`You can add sight-ins, marks, level checks and notes; only ${archer} can change or delete their records.`}
    </Banner>
  );
}

const styles = StyleSheet.create({
  row: { flexDirection: 'row', flexWrap: 'wrap', gap: space.sm },
});
