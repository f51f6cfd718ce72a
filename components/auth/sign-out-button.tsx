import { useQueryClient } from '@tanstack/react-query';
import { useState } from 'react';
import { StyleSheet, View } from 'react-native';

import { useSignOut } from '@/components/auth/api';
import { flushOutbox, loadOutbox, outboxItems } from '@/components/offline/outbox';
import { signedInUserId } from '@/components/offline/send-or-keep';
import { useOnline } from '@/components/offline/use-online';
import { useOutbox } from '@/components/offline/use-outbox';
import { Banner } from '@/components/ui/banner';
import { Button, type ButtonProps } from '@/components/ui/button';
import { ConfirmBar } from '@/components/ui/confirm-bar';
import { space } from '@/components/theme';

export type SignOutButtonProps = Pick<ButtonProps, 'label' | 'variant' | 'icon' | 'testID'>;

/** "1 item is" / "3 items are". */
export const unsentPhrase = (count: number) => (count === 1 ? '1 item on this phone is' : `${count} items on this phone are`);

/**
 * A sign-out button that never drops typed work without asking: signing out
 * deletes the account's outbox from the device (a shared phone), so when it
 * holds writes not yet sent (waiting or refused) the archer is told how many
 * and may stay signed in (they are sent when the phone is online), send them
 * now, or sign out anyway. With an empty outbox it signs out at once.
 * Example: `<SignOutButton label="Sign out" variant="secondary" icon={SignOutIcon} />`
 */
export function SignOutButton({ label, variant = 'secondary', icon, testID }: SignOutButtonProps) {
  const queryClient = useQueryClient();
  const signOut = useSignOut();
  const online = useOnline();
  const unsent = useOutbox();
  const [asking, setAsking] = useState(false);
  const [sending, setSending] = useState(false);

  const start = async () => {
    // The outbox may still be loading from the device: count what is stored, not what is shown.
    const userId = signedInUserId(queryClient);
    if (userId !== null) await loadOutbox(userId);
    if (outboxItems().length === 0) signOut.mutate();
    else setAsking(true);
  };

  const sendNow = async () => {
    setSending(true);
    try {
      await flushOutbox(queryClient);
    } finally {
      setSending(false);
    }
  };

  const refused = unsent.filter((item) => item.state === 'refused').length;
  const waiting = unsent.length - refused;
  const count = unsent.length;
  const message = [
    `${unsentPhrase(count)} not sent yet; signing out deletes ${count === 1 ? 'it' : 'them'}.`,
    refused > 0
      ? `${refused} of them ${refused === 1 ? 'was' : 'were'} refused by the server: open the list at the top to copy or discard ${refused === 1 ? 'it' : 'them'}.`
      : null,
    waiting > 0
      ? online
        ? 'Stay signed in to keep them, or send them now.'
        : 'Stay signed in to keep them: they are sent when this phone is online again.'
      : null,
  ]
    .filter(Boolean)
    .join(' ');

  return (
    <View style={styles.wrap}>
      {signOut.isError ? (
        <Banner tone="error" title="Could not sign out">
          {signOut.error.message}
        </Banner>
      ) : null}
      {asking && count > 0 ? (
        <View style={styles.wrap} testID="sign-out-guard">
          <ConfirmBar
            title="Not sent yet"
            message={message}
            confirmLabel="Sign out anyway"
            pendingLabel="Signing out…"
            pending={signOut.isPending}
            onConfirm={() => signOut.mutate()}
            onCancel={() => setAsking(false)}
          />
          {online && waiting > 0 ? (
            <View style={styles.actions}>
              <Button label="Send them now" pendingLabel="Sending…" pending={sending} variant="primary" onPress={() => void sendNow()} />
            </View>
          ) : null}
        </View>
      ) : (
        <View style={styles.actions}>
          <Button
            label={label}
            pendingLabel="Signing out…"
            pending={signOut.isPending}
            variant={variant}
            icon={icon}
            testID={testID}
            onPress={() => void start()}
          />
        </View>
      )}
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: space.md },
  actions: { flexDirection: 'row', flexWrap: 'wrap', gap: space.md },
});
