/**
 * The device copy of the query cache (components/offline/query-persistence.ts)
 * is saved once per run of changes, after a short delay, in a task of its own:
 * never inside the task that changed the cache, never once per change, and
 * not at all after saving has stopped (sign-out, another account).
 */
import { QueryClient } from '@tanstack/react-query';

import { saveAfterChanges, saveDelayMs } from '@/components/offline/query-persistence';

describe('saving the device cache after changes', () => {
  beforeEach(() => jest.useFakeTimers());
  afterEach(() => jest.useRealTimers());

  it('saves once for a run of changes, after the delay, not in the task that made them', async () => {
    const client = new QueryClient();
    const saved: unknown[] = [];
    const stop = saveAfterChanges(client, () => saved.push(client.getQueryData(['bows', 'list'])));
    client.setQueryData(['me'], { user: { id: 1 } });
    client.setQueryData(['bows', 'list'], [{ id: 1 }]);
    client.setQueryData(['bows', 'list'], [{ id: 1 }, { id: 2 }]);
    expect(saved).toEqual([]);
    jest.advanceTimersByTime(saveDelayMs - 1);
    expect(saved).toEqual([]);
    jest.advanceTimersByTime(1);
    // One save, of the cache as it stood by then.
    expect(saved).toEqual([[{ id: 1 }, { id: 2 }]]);
    jest.advanceTimersByTime(10 * saveDelayMs);
    expect(saved).toHaveLength(1);
    // A later change is saved again.
    client.setQueryData(['bows', 'list'], []);
    jest.advanceTimersByTime(saveDelayMs);
    expect(saved).toEqual([[{ id: 1 }, { id: 2 }], []]);
    stop();
  });

  it('counts a mutation as a change, as the persist-client does', () => {
    const client = new QueryClient();
    const save = jest.fn();
    const stop = saveAfterChanges(client, save);
    client.getMutationCache().build(client, { mutationFn: async () => 1 });
    jest.advanceTimersByTime(saveDelayMs);
    expect(save).toHaveBeenCalledTimes(1);
    stop();
  });

  it('drops a pending save when saving stops, and hears no change after', () => {
    const client = new QueryClient();
    const save = jest.fn();
    const stop = saveAfterChanges(client, save);
    client.setQueryData(['bows', 'list'], [{ id: 1 }]);
    stop();
    jest.advanceTimersByTime(10 * saveDelayMs);
    client.setQueryData(['bows', 'list'], [{ id: 2 }]);
    jest.advanceTimersByTime(10 * saveDelayMs);
    expect(save).not.toHaveBeenCalled();
  });
});
