import { StyleSheet, View } from 'react-native';

import { Button } from '@/components/ui/button';
import { space } from '@/components/theme';

/**
 * Switches between the administrator's two pages.
 * Example: `<AdminTabs current="accounts" />`
 */
export function AdminTabs({ current }: { current: 'accounts' | 'audit' }) {
  return (
    <View style={styles.row} role="navigation" aria-label="Administration">
      <Button label="Accounts" variant={current === 'accounts' ? 'primary' : 'secondary'} href="/admin" />
      <Button label="Audit log" variant={current === 'audit' ? 'primary' : 'secondary'} href="/admin/audit" testID="admin-audit-tab" />
    </View>
  );
}

const styles = StyleSheet.create({
  row: { flexDirection: 'row', flexWrap: 'wrap', gap: space.sm },
});
