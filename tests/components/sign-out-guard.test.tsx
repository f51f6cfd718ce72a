import { act, fireEvent, screen, waitFor } from '@testing-library/react';

import { authKeys } from '@/components/auth/api';
import { SignOutButton } from '@/components/auth/sign-out-button';
import { keepInOutbox, outboxItems, unloadOutbox } from '@/components/offline/outbox';

import { jsonResponse, mockFetch, renderWithClient } from './helpers';

// The outbox's IndexedDB store, as an in-memory map (jsdom has no IndexedDB),
// so the test can see whether anything was deleted from the device.
const mockStored = new Map<string, unknown>();
jest.mock('@/components/offline/device-store', () => ({
  queriesKey: (userId: number) => `queries:${userId}`,
  cacheDb: { get: async () => undefined, set: async () => undefined, del: async () => undefined },
  outboxDb: {
    all: async () => [...mockStored.values()],
    put: async (id: string, value: unknown) => void mockStored.set(id, value),
    del: async (id: string) => void mockStored.delete(id),
    delMany: async (ids: string[]) => ids.forEach((id) => mockStored.delete(id)),
    keys: async () => [...mockStored.keys()],
  },
}));

const user = { id: 7, name: 'Tamsin Voller', email: 'tamsin@example.org', role: 'archer', distanceUnit: 'yd', lengthUnit: 'mm' };

function renderSignedIn() {
  const utils = renderWithClient(<SignOutButton label="Sign out" />);
  act(() => utils.queryClient.setQueryData(authKeys.me, user));
  return utils;
}

const signOutCalls = (fetchMock: jest.Mock) => fetchMock.mock.calls.filter(([path]) => path === '/api/auth/sign-out');

beforeEach(() => {
  mockStored.clear();
  unloadOutbox();
});

describe('SignOutButton (sign-out guard)', () => {
  it('signs out at once when nothing is waiting on the phone', async () => {
    const fetchMock = mockFetch();
    fetchMock.mockResolvedValue(jsonResponse(204));
    const { queryClient } = renderSignedIn();

    fireEvent.click(screen.getByRole('button', { name: 'Sign out' }));

    await waitFor(() => expect(queryClient.getQueryData(authKeys.me)).toBeNull());
    expect(signOutCalls(fetchMock)).toHaveLength(1);
    expect(screen.queryByTestId('sign-out-guard')).toBeNull();
  });

  it('with one waiting item, warns with the count and deletes nothing until "Sign out anyway"', async () => {
    const fetchMock = mockFetch();
    fetchMock.mockResolvedValue(jsonResponse(204));
    const { queryClient } = renderSignedIn();
    await act(async () => {
      await keepInOutbox({
        userId: user.id,
        kind: 'marks',
        title: 'New marks on Ridge 60',
        method: 'POST',
        path: '/api/sight-ins/3/marks',
        body: { yards: 20 },
        bowId: 3,
        recordId: 3,
      });
    });
    expect(mockStored.size).toBe(1);

    fireEvent.click(screen.getByRole('button', { name: 'Sign out' }));

    const guard = await screen.findByTestId('sign-out-guard');
    expect(guard.textContent).toContain('1 item on this phone is not sent yet; signing out deletes it.');
    expect(signOutCalls(fetchMock)).toHaveLength(0);
    expect(mockStored.size).toBe(1);
    expect(outboxItems()).toHaveLength(1);
    expect(queryClient.getQueryData(authKeys.me)).toEqual(user);

    // "Keep it" stays signed in with the item kept.
    fireEvent.click(screen.getByRole('button', { name: 'Keep it' }));
    expect(screen.queryByTestId('sign-out-guard')).toBeNull();
    expect(mockStored.size).toBe(1);

    fireEvent.click(screen.getByRole('button', { name: 'Sign out' }));
    fireEvent.click(await screen.findByRole('button', { name: 'Sign out anyway' }));

    await waitFor(() => expect(queryClient.getQueryData(authKeys.me)).toBeNull());
    expect(signOutCalls(fetchMock)).toHaveLength(1);
    expect(mockStored.size).toBe(0);
    expect(outboxItems()).toHaveLength(0);
  });

  it('counts refused items too and says where to copy them', async () => {
    mockFetch().mockResolvedValue(jsonResponse(204));
    renderSignedIn();
    await act(async () => {
      await keepInOutbox({
        userId: user.id,
        kind: 'change',
        title: 'String changed',
        method: 'POST',
        path: '/api/bows/3/changes',
        body: {},
        bowId: 3,
        recordId: null,
      });
      const [first] = outboxItems();
      mockStored.set(first.id, { ...first, state: 'refused' });
      await keepInOutbox({
        userId: user.id,
        kind: 'change',
        title: 'Peep moved',
        method: 'POST',
        path: '/api/bows/3/changes',
        body: {},
        bowId: 3,
        recordId: null,
      });
    });
    // Reload from the "device" so the refused state is what the outbox holds.
    act(() => unloadOutbox());

    fireEvent.click(screen.getByRole('button', { name: 'Sign out' }));

    const guard = await screen.findByTestId('sign-out-guard');
    expect(guard.textContent).toContain('2 items on this phone are not sent yet; signing out deletes them.');
    expect(guard.textContent).toContain('1 of them was refused');
    expect(mockStored.size).toBe(2);
  });
});
