import { onlineManager } from '@tanstack/react-query';
import { useSyncExternalStore } from 'react';

const subscribe = (listener: () => void) => onlineManager.subscribe(listener);
const snapshot = () => onlineManager.isOnline();

/** Whether the app can reach its server (see connectivity.ts), re-rendering when that changes. */
export function useOnline(): boolean {
  return useSyncExternalStore(subscribe, snapshot, snapshot);
}
