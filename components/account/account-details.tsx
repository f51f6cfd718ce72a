import { StyleSheet, View } from 'react-native';

import { Text } from '@/components/ui/text';
import { borders, colors, space } from '@/components/theme';
import type { User } from '@/shared/auth';

const roleWords: Record<User['role'], string> = {
  archer: 'Archer — owns bows and their records',
  tech: 'Technician — works on bows shared with you',
  admin: 'Administrator — runs the service',
};

function Row({ label, value, last = false }: { label: string; value: string; last?: boolean }) {
  return (
    <View style={[styles.row, !last && styles.rowRule]}>
      <Text variant="small" tone="soft" style={styles.label}>
        {label}
      </Text>
      <Text style={styles.value}>{value}</Text>
    </View>
  );
}

/**
 * The signed-in user's details as label / value rows.
 * Example: `<AccountDetails user={me} />`
 */
export function AccountDetails({ user }: { user: User }) {
  return (
    <View>
      <Row label="Name" value={user.name} />
      <Row label="E-mail" value={user.email} />
      <Row label="Role" value={roleWords[user.role]} last />
    </View>
  );
}

const styles = StyleSheet.create({
  row: { flexDirection: 'row', flexWrap: 'wrap', gap: space.xs, paddingVertical: space.md, alignItems: 'baseline' },
  rowRule: { borderBottomWidth: borders.hairline, borderBottomColor: colors.line },
  label: { width: 140 },
  value: { flexGrow: 1, flexShrink: 1, flexBasis: 200 },
});
