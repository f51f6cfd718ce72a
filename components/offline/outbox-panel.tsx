import { useQueryClient } from '@tanstack/react-query';
import { useState } from 'react';
import { StyleSheet, View } from 'react-native';

import { discardOutboxItem, flushOutbox, outboxItemText, retryOutboxItem, type OutboxItem } from '@/components/offline/outbox';
import { useOutbox } from '@/components/offline/use-outbox';
import { useOnline } from '@/components/offline/use-online';
import { Button } from '@/components/ui/button';
import { Text } from '@/components/ui/text';
import { borders, colors, radii, space } from '@/components/theme';

/** "at 11:42" today, "on 1 Dec at 11:42" another day (the device's clock and language). */
export function seenAt(time: number, now = Date.now()): string {
  const date = new Date(time);
  const clock = date.toLocaleTimeString(undefined, { hour: 'numeric', minute: '2-digit' });
  if (new Date(now).toDateString() === date.toDateString()) return `at ${clock}`;
  return `on ${date.toLocaleDateString(undefined, { day: 'numeric', month: 'short' })} at ${clock}`;
}

const stateWords: Record<OutboxItem['state'], string> = {
  waiting: 'On this phone, not sent yet',
  sending: 'Sending…',
  refused: 'Refused by the server',
};

/** Copies text where the browser allows it; resolves to whether it did. */
async function copyText(text: string): Promise<boolean> {
  const clipboard = (globalThis as { navigator?: { clipboard?: { writeText?: (value: string) => Promise<void> } } }).navigator?.clipboard;
  if (!clipboard?.writeText) return false;
  try {
    await clipboard.writeText(text);
    return true;
  } catch {
    return false;
  }
}

function OutboxRow({ item, index }: { item: OutboxItem; index: number }) {
  const [showing, setShowing] = useState(false);
  const [asking, setAsking] = useState(false);
  const [copied, setCopied] = useState<'yes' | 'no' | null>(null);
  const refused = item.state === 'refused';
  return (
    <View
      style={[styles.item, refused && styles.itemRefused]}
      testID={`outbox-item-${index}`}
      aria-label={`${item.title}: ${stateWords[item.state]}`}
      role="group"
    >
      <Text variant="label">{item.title}</Text>
      <Text variant="small" tone={refused ? 'failed' : 'due'} testID={`outbox-state-${index}`}>
        {stateWords[item.state]} · made {seenAt(Date.parse(item.createdAt))}
      </Text>
      {refused && item.refusal ? (
        <>
          <Text variant="small" testID={`outbox-reason-${index}`}>
            {`Why: ${item.refusal.message}`}
            {Object.values(item.refusal.fields).length > 0 ? ` (${Object.values(item.refusal.fields).join('; ')})` : ''}
          </Text>
          <Text variant="small" tone="soft">
            It stays on this phone until you copy what you typed or discard it.
          </Text>
        </>
      ) : null}
      {showing ? (
        <Text variant="caption" selectable style={styles.body} testID={`outbox-body-${index}`}>
          {outboxItemText(item)}
        </Text>
      ) : null}
      {copied ? (
        <Text variant="small" tone="soft">
          {copied === 'yes' ? 'Copied.' : 'This browser would not copy: select the text above instead.'}
        </Text>
      ) : null}
      <View style={styles.actions}>
        <Button
          label={showing ? 'Hide what was typed' : 'Show what was typed'}
          variant="quiet"
          onPress={() => setShowing(!showing)}
          testID={`outbox-show-${index}`}
        />
        <Button
          label="Copy"
          variant="quiet"
          onPress={async () => {
            setShowing(true);
            setCopied((await copyText(outboxItemText(item))) ? 'yes' : 'no');
          }}
          testID={`outbox-copy-${index}`}
        />
        {refused ? (
          <Button label="Try again" variant="quiet" onPress={() => retryOutboxItem(item.id)} testID={`outbox-retry-${index}`} />
        ) : null}
        {asking ? (
          <>
            <Button
              label="Discard for good"
              variant="danger"
              onPress={() => discardOutboxItem(item.id)}
              testID={`outbox-discard-confirm-${index}`}
            />
            <Button label="Keep it" variant="quiet" onPress={() => setAsking(false)} />
          </>
        ) : (
          <Button
            label="Discard"
            variant="quiet"
            onPress={() => setAsking(true)}
            disabled={item.state === 'sending'}
            testID={`outbox-discard-${index}`}
          />
        )}
      </View>
    </View>
  );
}

/**
 * The signed-in account's outbox: each write kept on this phone, waiting or
 * refused (with the server's reason), to see, copy, retry or discard.
 * Nothing when the outbox is empty.
 * Example: `<OutboxPanel />`
 */
export function OutboxPanel() {
  const items = useOutbox();
  const online = useOnline();
  const queryClient = useQueryClient();
  if (items.length === 0) return null;
  const waiting = items.filter((item) => item.state !== 'refused').length;
  const refused = items.length - waiting;
  const summary = [waiting > 0 ? `${waiting} on this phone, not sent yet` : null, refused > 0 ? `${refused} refused by the server` : null]
    .filter(Boolean)
    .join(' · ');
  return (
    <View style={styles.panel} testID="outbox-panel" role="region" aria-label="Kept on this phone">
      <View style={styles.head}>
        <Text variant="label" style={styles.grow}>
          {summary}
        </Text>
        {online && waiting > 0 ? (
          <Button label="Send now" variant="secondary" onPress={() => flushOutbox(queryClient)} testID="outbox-send" />
        ) : null}
      </View>
      {waiting > 0 ? (
        <Text variant="small" tone="soft">
          {online
            ? 'Sending in the order you made them.'
            : 'Sent in the order you made them when the signal is back. They stay here if you close the app.'}
        </Text>
      ) : null}
      {items.map((item, index) => (
        <OutboxRow key={item.id} item={item} index={index} />
      ))}
    </View>
  );
}

const styles = StyleSheet.create({
  panel: { gap: space.sm },
  head: { flexDirection: 'row', alignItems: 'center', gap: space.md, flexWrap: 'wrap' },
  grow: { flexGrow: 1, flexShrink: 1 },
  item: {
    gap: space.xs,
    padding: space.md,
    borderRadius: radii.md,
    borderWidth: borders.hairline,
    borderColor: colors.due,
    backgroundColor: colors.surface,
  },
  itemRefused: { borderColor: colors.failed, borderWidth: borders.focus, backgroundColor: colors.failedTint },
  body: { fontFamily: 'monospace', backgroundColor: colors.sunken, padding: space.sm, borderRadius: radii.sm },
  actions: { flexDirection: 'row', flexWrap: 'wrap', columnGap: space.xs },
});
