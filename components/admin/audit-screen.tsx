import { useState } from 'react';
import { StyleSheet, View } from 'react-native';

import { AdminTabs } from '@/components/admin/admin-tabs';
import { useAdminAudit } from '@/components/admin/api';
import { AuditList } from '@/components/shares/audit-list';
import { Button } from '@/components/ui/button';
import { ErrorView } from '@/components/ui/error-view';
import { LoadingView } from '@/components/ui/loading-view';
import { Screen } from '@/components/ui/screen';
import { ScreenTitle } from '@/components/ui/screen-title';
import { SectionHeading } from '@/components/ui/section-heading';
import { Text } from '@/components/ui/text';
import { space } from '@/components/theme';

/** The whole audit log for the administrator: technicians' writes, shares, role changes, disables. */
export function AdminAuditScreen() {
  const [page, setPage] = useState(1);
  const audit = useAdminAudit(page);
  const pages = audit.data ? Math.max(1, Math.ceil(audit.data.total / audit.data.pageSize)) : 1;
  return (
    <Screen testID="admin-audit">
      <ScreenTitle name="Audit log" />
      <SectionHeading level={1} title="Audit log" description="Newest first: what technicians did on shared bows, every share, and every account change." />
      <AdminTabs current="audit" />
      {audit.isPending ? <LoadingView label="Loading the log…" /> : null}
      {audit.isError ? <ErrorView title="The log could not be loaded" error={audit.error} onRetry={() => audit.refetch()} /> : null}
      {audit.data && audit.data.entries.length === 0 ? <Text tone="soft">Nothing has been recorded yet.</Text> : null}
      {audit.data ? <AuditList entries={audit.data.entries} showBow /> : null}
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
  pager: { flexDirection: 'row', alignItems: 'center', gap: space.md },
});
