import { StyleSheet, View } from 'react-native';

import { Button } from '@/components/ui/button';
import { Text } from '@/components/ui/text';
import { borders, colors, radii, space } from '@/components/theme';
import type { AuditEntry } from '@/shared/audit';

const actionWords: Record<string, string> = {
  created: 'Added',
  updated: 'Changed',
  deleted: 'Deleted',
  invited: 'Invited',
  accepted: 'Accepted',
  revoked: 'Ended share',
  sent: 'Sent',
  'role-changed': 'Role changed',
  disabled: 'Disabled',
  enabled: 'Enabled',
  'account-deleted': 'Account deleted',
};

const roleWords: Record<string, string> = { archer: 'archer', tech: 'technician', admin: 'administrator' };

const when = (iso: string) => new Date(iso).toLocaleString(undefined, { dateStyle: 'medium', timeStyle: 'short' });

export interface AuditListProps {
  entries: AuditEntry[];
  /** Show which bow each entry is about, with its archer (the administrator's log). */
  showBow?: boolean;
  /** Offer "only this bow" / "only this account" on each entry (the administrator's filters). */
  onFilter?: (filter: { bow?: { id: number; nickname: string }; account?: { id: number; name: string } }) => void;
  testID?: string;
}

/** The bow an entry is about, in words: "Fen slider (Rhoswen Alder’s)"; null when it names no bow (or the bow is gone). */
function bowWords(entry: AuditEntry): string | null {
  return entry.bow ? `${entry.bow.nickname} (${entry.bow.ownerName || 'a former account'}’s)` : null;
}

/**
 * Audit entries as a list, newest first: when, who (with their role), what.
 * Example: `<AuditList entries={audit.data.entries} />`
 */
export function AuditList({ entries, showBow = false, onFilter, testID }: AuditListProps) {
  return (
    <View style={styles.list} testID={testID}>
      {entries.map((entry) => (
        <View key={entry.id} style={styles.row} testID={`audit-${entry.id}`}>
          <View style={styles.top}>
            <Text variant="label" style={styles.action}>
              {actionWords[entry.action] ?? entry.action}
            </Text>
            <Text variant="small" tone="soft">
              {when(entry.at)}
            </Text>
          </View>
          <Text>{entry.summary}</Text>
          <Text variant="small" tone="soft">
            {entry.actor
              ? `By ${entry.actor.name} (${roleWords[entry.actor.role] ?? entry.actor.role})`
              : entry.action === 'account-deleted'
                ? 'By the account’s owner'
                : 'By a former account'}
            {showBow && bowWords(entry) ? ` · on ${bowWords(entry)}` : ''}
            {showBow && entry.account ? ` · account ${entry.account.name} <${entry.account.email}>` : ''}
          </Text>
          {onFilter ? (
            <View style={styles.filters}>
              {entry.bow ? (
                <Button
                  label={`Only ${entry.bow.nickname}`}
                  variant="quiet"
                  onPress={() => onFilter({ bow: entry.bow! })}
                  testID={`audit-${entry.id}-only-bow`}
                />
              ) : null}
              {entry.actor ? (
                <Button
                  label={`Only ${entry.actor.name}`}
                  variant="quiet"
                  onPress={() => onFilter({ account: entry.actor! })}
                  testID={`audit-${entry.id}-only-actor`}
                />
              ) : null}
              {entry.account && entry.account.id !== entry.actor?.id ? (
                <Button label={`Only ${entry.account.name}`} variant="quiet" onPress={() => onFilter({ account: entry.account! })} />
              ) : null}
            </View>
          ) : null}
        </View>
      ))}
    </View>
  );
}

const styles = StyleSheet.create({
  list: { gap: space.xs },
  row: {
    padding: space.md,
    gap: space.xxs,
    borderRadius: radii.md,
    backgroundColor: colors.surface,
    borderWidth: borders.hairline,
    borderColor: colors.line,
  },
  top: { flexDirection: 'row', flexWrap: 'wrap', justifyContent: 'space-between', gap: space.sm },
  action: { color: colors.info },
  filters: { flexDirection: 'row', flexWrap: 'wrap', marginLeft: -space.md },
});
