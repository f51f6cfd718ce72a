import { useState } from 'react';
import { StyleSheet, View } from 'react-native';

import { AdminTabs } from '@/components/admin/admin-tabs';
import { useAdminAudit, type AuditFilters } from '@/components/admin/api';
import { AuditList } from '@/components/shares/audit-list';
import { Button } from '@/components/ui/button';
import { Card } from '@/components/ui/card';
import { ErrorView } from '@/components/ui/error-view';
import { LoadingView } from '@/components/ui/loading-view';
import { Screen } from '@/components/ui/screen';
import { ScreenTitle } from '@/components/ui/screen-title';
import { SectionHeading } from '@/components/ui/section-heading';
import { SegmentedControl } from '@/components/ui/segmented-control';
import { Text } from '@/components/ui/text';
import { space } from '@/components/theme';

/** Words for the kinds of record in the log; an unknown kind shows as stored, dashes as spaces. */
const kindWords: Record<string, string> = {
  account: 'Accounts',
  share: 'Shares',
  bow: 'Bows',
  'arrow-build': 'Arrow builds',
  'sight-in': 'Sight-ins',
  'sight-in-mark': 'Marks',
  tape: 'Tapes',
  'tape-sheet': 'Sent sheets',
  'level-check': 'Level checks',
  'level-step': 'Level steps',
  photo: 'Photos',
  'bow-change': 'Changes',
};
const kindWord = (kind: string) => kindWords[kind] ?? kind.replace(/-/g, ' ');

/**
 * The whole audit log for the administrator: technicians' writes, shares,
 * role changes, disables, deleted accounts; each entry names its bow (with
 * the archer) and its accounts, and can narrow the log to that bow or account;
 * a kind of record narrows it further.
 */
export function AdminAuditScreen() {
  const [page, setPage] = useState(1);
  const [filters, setFilters] = useState<AuditFilters>({});
  const [names, setNames] = useState<{ bow?: string; account?: string }>({});
  const audit = useAdminAudit(page, filters);
  const pages = audit.data ? Math.max(1, Math.ceil(audit.data.total / audit.data.pageSize)) : 1;
  const narrow = (next: AuditFilters, words: { bow?: string; account?: string } = {}) => {
    setPage(1);
    setFilters({ ...filters, ...next });
    setNames({ ...names, ...words });
  };
  const clear = (key: keyof AuditFilters) => {
    setPage(1);
    const { [key]: _gone, ...rest } = filters;
    setFilters(rest);
  };
  const kindOptions = [
    { value: 'all', label: 'All kinds' },
    ...(audit.data?.kinds ?? []).map((kind) => ({ value: kind, label: kindWord(kind) })),
  ];
  const bowName = audit.data?.filters?.bow?.nickname ?? names.bow;
  const accountName = audit.data?.filters?.account?.name ?? names.account ?? 'a former account';

  return (
    <Screen testID="admin-audit">
      <ScreenTitle name="Audit log" />
      <SectionHeading
        level={1}
        title="Audit log"
        description="Newest first: what technicians did on shared bows, every share, and every account change."
      />
      <AdminTabs current="audit" />
      <Card style={styles.filters}>
        <SegmentedControl<string>
          label="Kind of record"
          options={kindOptions}
          value={filters.kind ?? 'all'}
          onChange={(kind) => (kind === 'all' ? clear('kind') : narrow({ kind }))}
          testID="audit-kind"
        />
        {filters.bowId || filters.accountId ? (
          <View style={styles.active} testID="audit-active-filters">
            {filters.bowId ? (
              <Button
                label={`Bow: ${bowName ?? filters.bowId} ✕`}
                variant="secondary"
                accessibilityLabel={`Stop showing only the bow ${bowName ?? ''}`}
                onPress={() => clear('bowId')}
                testID="audit-clear-bow"
              />
            ) : null}
            {filters.accountId ? (
              <Button
                label={`Account: ${accountName} ✕`}
                variant="secondary"
                accessibilityLabel={`Stop showing only ${accountName}`}
                onPress={() => clear('accountId')}
                testID="audit-clear-account"
              />
            ) : null}
          </View>
        ) : (
          <Text variant="small" tone="soft">
            Narrow the log to one bow or one account with the “Only …” links on its entries.
          </Text>
        )}
      </Card>
      {audit.isPending ? <LoadingView label="Loading the log…" /> : null}
      {audit.isError ? <ErrorView title="The log could not be loaded" error={audit.error} onRetry={() => audit.refetch()} /> : null}
      {audit.data && audit.data.entries.length === 0 ? (
        <Text tone="soft">Nothing has been recorded{filters.bowId || filters.accountId || filters.kind ? ' that matches' : ' yet'}.</Text>
      ) : null}
      {audit.data ? (
        <>
          <Text
            variant="small"
            tone="soft"
            testID="audit-total"
          >{`${audit.data.total} ${audit.data.total === 1 ? 'entry' : 'entries'}`}</Text>
          <AuditList
            entries={audit.data.entries}
            showBow
            onFilter={({ bow, account }) =>
              narrow(bow ? { bowId: bow.id } : { accountId: account!.id }, bow ? { bow: bow.nickname } : { account: account!.name })
            }
          />
        </>
      ) : null}
      {pages > 1 ? (
        <View style={styles.pager}>
          <Button label="Newer" variant="secondary" disabled={page <= 1} onPress={() => setPage(page - 1)} />
          <Text>{`Page ${page} of ${pages}`}</Text>
          <Button label="Older" variant="secondary" disabled={page >= pages} onPress={() => setPage(page + 1)} />
        </View>
      ) : null}
    </Screen>
  );
}

const styles = StyleSheet.create({
  filters: { gap: space.md },
  active: { flexDirection: 'row', flexWrap: 'wrap', gap: space.sm },
  pager: { flexDirection: 'row', alignItems: 'center', gap: space.md },
});
