import { useEffect, useSyncExternalStore } from 'react';

import { onOutboxSent, outboxItems, subscribeOutbox, type OutboxItem, type OutboxSent } from '@/components/offline/outbox';

/**
 * The outbox of the signed-in account (waiting, sending and refused writes),
 * re-rendering as it changes; optionally only a bow's or one record's.
 * Example: `const waiting = useOutbox({ bowId: 3 })`
 */
export function useOutbox(filter: { bowId?: number; ids?: readonly string[] } = {}): OutboxItem[] {
  const all = useSyncExternalStore(subscribeOutbox, outboxItems, outboxItems);
  return all.filter(
    (item) => (filter.bowId === undefined || item.bowId === filter.bowId) && (filter.ids === undefined || filter.ids.includes(item.id)),
  );
}

/** Calls `handler` when a write from the outbox reaches the server. */
export function useOutboxSent(handler: (sent: OutboxSent) => void) {
  useEffect(() => onOutboxSent(handler), [handler]);
}
