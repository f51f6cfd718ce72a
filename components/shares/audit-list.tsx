import { StyleSheet, View } from 'react-native';

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
};

const roleWords: Record<string, string> = { archer: 'archer', tech: 'technician', admin: 'administrator' };

const when = (iso: string) => new Date(iso).toLocaleString(undefined, { dateStyle: 'medium', timeStyle: 'short' });

export interface AuditListProps {
  entries: AuditEntry[];
  /** Show which bow each entry is about (the administrator's log). */
  showBow?: boolean;
  testID?: string;
}

/**
 * Audit entries as a list, newest first: when, who (with their role), what.
 * Example: `<AuditList entries={audit.data.entries} />`
 */
export function AuditList({ entries, showBow = false, testID }: AuditListProps) {
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
            {entry.actor ? `By ${entry.actor.name} (${roleWords[entry.actor.role] ?? entry.actor.role})` : 'By a removed account'}
            {showBow && entry.bowId ? ` · bow ${entry.bowId}` : ''}
          </Text>
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
});
