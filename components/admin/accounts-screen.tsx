import { useState } from 'react';
import { StyleSheet, View } from 'react-native';

import { AccountRow } from '@/components/admin/account-row';
import { AdminTabs } from '@/components/admin/admin-tabs';
import { useAccounts } from '@/components/admin/api';
import { useMe } from '@/components/auth/api';
import { Button } from '@/components/ui/button';
import { ErrorView } from '@/components/ui/error-view';
import { LoadingView } from '@/components/ui/loading-view';
import { Screen } from '@/components/ui/screen';
import { ScreenTitle } from '@/components/ui/screen-title';
import { SectionHeading } from '@/components/ui/section-heading';
import { SegmentedControl } from '@/components/ui/segmented-control';
import { Text } from '@/components/ui/text';
import { TextField } from '@/components/ui/text-field';
import { useWide } from '@/components/ui/use-wide';
import { space } from '@/components/theme';
import type { Role } from '@/shared/auth';

const filterOptions = [
  { value: 'all', label: 'All' },
  { value: 'archer', label: 'Archers' },
  { value: 'tech', label: 'Technicians' },
  { value: 'admin', label: 'Administrators' },
] as const;

/** The administrator's accounts list: search, filter by role, change roles, disable or enable. */
export function AccountsScreen() {
  const me = useMe();
  const wide = useWide();
  const [q, setQ] = useState('');
  const [role, setRole] = useState<Role | 'all'>('all');
  const [page, setPage] = useState(1);
  const accounts = useAccounts(q, role, page);
  const pages = accounts.data ? Math.max(1, Math.ceil(accounts.data.total / accounts.data.pageSize)) : 1;

  return (
    <Screen testID="admin-accounts">
      <ScreenTitle name="Accounts" />
      <SectionHeading
        level={1}
        title="Accounts"
        description="Everyone with a Pinwright account. Role changes take effect on their next request."
      />
      <AdminTabs current="accounts" />
      <View style={[styles.filters, wide && styles.filtersWide]}>
        <View style={wide && styles.searchWide}>
          <TextField
            label="Search"
            hint="Part of a name or e-mail address"
            value={q}
            onChangeText={(text) => {
              setQ(text);
              setPage(1);
            }}
            autoCapitalize="none"
            autoCorrect={false}
            testID="account-search"
          />
        </View>
        <SegmentedControl
          label="Role"
          options={filterOptions}
          value={role}
          onChange={(value) => {
            setRole(value);
            setPage(1);
          }}
        />
      </View>
      {accounts.isPending ? <LoadingView label="Loading the accounts…" /> : null}
      {accounts.isError ? (
        <ErrorView title="The accounts could not be loaded" error={accounts.error} onRetry={() => accounts.refetch()} />
      ) : null}
      {accounts.data ? (
        <>
          <Text tone="soft">{`${accounts.data.total} account${accounts.data.total === 1 ? '' : 's'}${q.trim() ? ` matching “${q.trim()}”` : ''}`}</Text>
          <View style={[styles.list, wide && styles.listWide]}>
            {accounts.data.accounts.map((account) => (
              <View key={account.id} style={wide ? styles.cellWide : undefined}>
                <AccountRow account={account} selfId={me.data?.id ?? 0} />
              </View>
            ))}
          </View>
          {pages > 1 ? (
            <View style={styles.pager}>
              <Button label="Previous" variant="secondary" disabled={page <= 1} onPress={() => setPage(page - 1)} />
              <Text>{`Page ${page} of ${pages}`}</Text>
              <Button label="Next" variant="secondary" disabled={page >= pages} onPress={() => setPage(page + 1)} />
            </View>
          ) : null}
        </>
      ) : null}
    </Screen>
  );
}

const styles = StyleSheet.create({
  filters: { gap: space.md },
  filtersWide: { flexDirection: 'row', alignItems: 'flex-end', flexWrap: 'wrap' },
  // A basis only in the row: in the phone's column a basis is a height (it left a 280 px gap).
  searchWide: { flexGrow: 1, flexBasis: 280 },
  list: { gap: space.sm },
  listWide: { flexDirection: 'row', flexWrap: 'wrap' },
  cellWide: { flexBasis: 460, flexGrow: 1 },
  pager: { flexDirection: 'row', alignItems: 'center', gap: space.md },
});
