import { useState } from 'react';
import { StyleSheet, View } from 'react-native';

import { useUpdateAccount } from '@/components/admin/api';
import { Banner } from '@/components/ui/banner';
import { Button } from '@/components/ui/button';
import { Card } from '@/components/ui/card';
import { ConfirmBar } from '@/components/ui/confirm-bar';
import { SegmentedControl } from '@/components/ui/segmented-control';
import { Text } from '@/components/ui/text';
import { space } from '@/components/theme';
import type { AdminAccount } from '@/shared/admin';
import type { Role } from '@/shared/auth';

const roleOptions = [
  { value: 'archer', label: 'Archer' },
  { value: 'tech', label: 'Technician' },
  { value: 'admin', label: 'Administrator' },
] as const;

export interface AccountRowProps {
  account: AdminAccount;
  /** The signed-in administrator (who cannot disable or demote themself). */
  selfId: number;
}

const roleWords: Record<Role, string> = { archer: 'an archer', tech: 'a technician', admin: 'an administrator' };
const roleMeaning: Record<Role, string> = {
  archer: 'They own bows and their records.',
  tech: 'They work on bows archers share with them: they may add records there, never change or delete the archer’s.',
  admin: 'They can change every account’s role, disable accounts and read the whole audit log.',
};

/**
 * One account in the administrator's list: its role (a new role is asked
 * about first, then "Saved" says it took) and a disable / enable action
 * (disabling asks first: it signs the person out everywhere).
 * Example: `<AccountRow account={account} selfId={me.id} />`
 */
export function AccountRow({ account, selfId }: AccountRowProps) {
  const update = useUpdateAccount();
  const [asking, setAsking] = useState(false);
  const [newRole, setNewRole] = useState<Role | null>(null);
  const [saved, setSaved] = useState<string | null>(null);
  const self = account.id === selfId;
  return (
    <Card testID={`account-${account.id}`}>
      <View style={styles.top}>
        <View style={styles.words}>
          <Text variant="label">{account.name}</Text>
          <Text variant="small" tone="soft">
            {account.email}
            {account.createdAt ? ` · since ${new Date(account.createdAt).toLocaleDateString(undefined, { dateStyle: 'medium' })}` : ''}
          </Text>
        </View>
        {account.disabled ? (
          <Text variant="label" tone="failed">
            Disabled
          </Text>
        ) : null}
      </View>
      <SegmentedControl<Role>
        label="Role"
        hint={self ? 'Your own role stays administrator.' : undefined}
        options={roleOptions}
        value={newRole ?? account.role}
        disabled={self || update.isPending}
        onChange={(role) => {
          setSaved(null);
          update.reset();
          setNewRole(role === account.role ? null : role);
        }}
        testID={`role-${account.id}`}
      />
      {newRole ? (
        <ConfirmBar
          title={`Make ${account.name} ${roleWords[newRole]}?`}
          message={`${roleMeaning[newRole]} The change takes effect on their next request.`}
          confirmLabel="Change the role"
          pendingLabel="Saving…"
          pending={update.isPending}
          onConfirm={() =>
            update.mutate(
              { id: account.id, update: { role: newRole } },
              {
                onSuccess: () => {
                  setSaved(`Saved: ${account.name} is now ${roleWords[newRole]}.`);
                  setNewRole(null);
                },
              },
            )
          }
          onCancel={() => setNewRole(null)}
          testID={`role-confirm-${account.id}`}
        />
      ) : null}
      <View accessibilityLiveRegion="polite">
        {saved ? (
          <Text variant="small" tone="verified" testID={`role-saved-${account.id}`}>
            {saved}
          </Text>
        ) : null}
      </View>
      {update.isError ? (
        <Banner tone="error" title="Could not change the account">
          {update.error.message}
        </Banner>
      ) : null}
      {!self && !asking ? (
        <View style={styles.row}>
          {account.disabled ? (
            <Button
              label="Enable the account"
              variant="secondary"
              pending={update.isPending}
              onPress={() => update.mutate({ id: account.id, update: { disabled: false } })}
            />
          ) : (
            <Button label="Disable the account" variant="danger" onPress={() => setAsking(true)} testID={`disable-${account.id}`} />
          )}
        </View>
      ) : null}
      {asking ? (
        <ConfirmBar
          title={`Disable ${account.name}?`}
          message="They are signed out everywhere at once and cannot sign in until the account is enabled again. Their records stay."
          confirmLabel="Disable"
          pendingLabel="Disabling…"
          pending={update.isPending}
          onConfirm={() => update.mutate({ id: account.id, update: { disabled: true } }, { onSuccess: () => setAsking(false) })}
          onCancel={() => setAsking(false)}
        />
      ) : null}
    </Card>
  );
}

const styles = StyleSheet.create({
  top: { flexDirection: 'row', flexWrap: 'wrap', gap: space.sm, justifyContent: 'space-between' },
  words: { flexShrink: 1, gap: space.xxs },
  row: { flexDirection: 'row', flexWrap: 'wrap', gap: space.sm },
});
