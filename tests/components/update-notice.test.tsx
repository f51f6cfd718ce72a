/**
 * The "new version is ready" notice: nothing until a new service worker is
 * waiting; then the notice, and Reload asks the waiting worker to take over
 * and reloads once it has. workbox-window is replaced by a fake that lets the
 * test play the browser's part.
 */
import { QueryClient, QueryClientProvider } from '@tanstack/react-query';
import { act, fireEvent, render, screen } from '@testing-library/react';

import { loadWorkbox } from '@/components/shell/load-workbox';
import { UpdateNotice } from '@/components/shell/update-notice.web';

type Listener = (event?: unknown) => void;
const mockWorkboxes: MockWorkbox[] = [];
class MockWorkbox {
  listeners = new Map<string, Listener[]>();
  register = jest.fn(async () => undefined);
  update = jest.fn(async () => undefined);
  messageSkipWaiting = jest.fn();
  constructor(public url: string) {
    mockWorkboxes.push(this);
  }
  addEventListener(type: string, listener: Listener) {
    this.listeners.set(type, [...(this.listeners.get(type) ?? []), listener]);
  }
  emit(type: string) {
    for (const listener of this.listeners.get(type) ?? []) listener({ type });
  }
}
// The notice fetches workbox-window after the page has loaded (load-workbox.ts).
jest.mock('@/components/shell/load-workbox', () => ({
  loadWorkbox: jest.fn(async () => ({ Workbox: jest.fn((url: string) => new MockWorkbox(url)) })),
}));

const reload = jest.fn();
beforeAll(() => {
  (globalThis as { __DEV__?: boolean }).__DEV__ = false; // the notice is off under the Expo dev server
  Object.defineProperty(navigator, 'serviceWorker', { value: {}, configurable: true });
  Object.defineProperty(window, 'location', { value: { ...window.location, reload }, configurable: true });
});
afterAll(() => {
  (globalThis as { __DEV__?: boolean }).__DEV__ = true;
});
/** Lets `ms` of fake time pass, and the promises it sets off settle. */
async function pass(ms: number) {
  await act(async () => {
    jest.advanceTimersByTime(ms);
  });
}

/** The notice inside a query client, as in the app (it waits for the page's own requests). */
function renderWithQueries(queryClient = new QueryClient()) {
  render(
    <QueryClientProvider client={queryClient}>
      <UpdateNotice />
    </QueryClientProvider>,
  );
  return queryClient;
}

/** Renders the notice, lets the page be quiet (1 s) and the browser idle (jsdom has no requestIdleCallback: 1 s), and the import settle. */
async function renderNotice() {
  renderWithQueries();
  await pass(2000);
}

beforeEach(() => {
  jest.useFakeTimers();
  jest.mocked(loadWorkbox).mockClear();
  mockWorkboxes.length = 0;
  reload.mockClear();
});
afterEach(() => {
  jest.useRealTimers();
});

it('registers /sw.js once the page has loaded, its requests are settled and the browser is idle, fetching workbox-window only then', async () => {
  // jsdom's document is already "complete": 1 s of quiet, then the idle moment (1 s without requestIdleCallback).
  renderWithQueries();
  await pass(1999);
  expect(loadWorkbox).not.toHaveBeenCalled();
  await pass(1);
  expect(loadWorkbox).toHaveBeenCalledTimes(1);
  expect(mockWorkboxes).toHaveLength(1);
  expect(mockWorkboxes[0].url).toBe('/sw.js');
  expect(mockWorkboxes[0].register).toHaveBeenCalledTimes(1);
  expect(screen.queryByTestId('update-notice')).toBeNull();
});

it('waits while the page’s own requests are out, so the worker’s downloads do not share a weak signal with them', async () => {
  const queryClient = new QueryClient();
  let answer: (value: string) => void = () => {};
  void queryClient.fetchQuery({ queryKey: ['me'], queryFn: () => new Promise<string>((resolve) => (answer = resolve)) });
  renderWithQueries(queryClient);
  await pass(10_000);
  expect(loadWorkbox).not.toHaveBeenCalled();
  await act(async () => {
    answer('archer');
  });
  await pass(1999);
  expect(loadWorkbox).not.toHaveBeenCalled();
  await pass(1);
  expect(loadWorkbox).toHaveBeenCalledTimes(1);
});

it('starts the worker after 15 s even if a request never ends', async () => {
  // 15 s cap, then the idle moment (1 s in jsdom, which has no requestIdleCallback).
  const queryClient = new QueryClient();
  void queryClient.fetchQuery({ queryKey: ['hung'], queryFn: () => new Promise<string>(() => {}) });
  renderWithQueries(queryClient);
  await pass(15_999);
  expect(loadWorkbox).not.toHaveBeenCalled();
  await pass(1);
  expect(loadWorkbox).toHaveBeenCalledTimes(1);
});

it('shows the notice when a new worker waits, and Reload hands over before reloading', async () => {
  await renderNotice();
  const wb = mockWorkboxes[0];
  // A worker taking control before the archer asked (first install) reloads nothing.
  act(() => wb.emit('controlling'));
  expect(reload).not.toHaveBeenCalled();

  act(() => wb.emit('waiting'));
  screen.getByText('A new version of Pinwright is ready.');
  expect(wb.messageSkipWaiting).not.toHaveBeenCalled();
  fireEvent.click(screen.getByRole('button', { name: 'Reload for the new version' }));
  expect(wb.messageSkipWaiting).toHaveBeenCalledTimes(1);
  screen.getByText('Reloading…');
  expect(reload).not.toHaveBeenCalled();
  act(() => wb.emit('controlling'));
  expect(reload).toHaveBeenCalledTimes(1);
});

it('reloads anyway when the hand-over is not reported within 3 s', async () => {
  await renderNotice();
  act(() => mockWorkboxes[0].emit('waiting'));
  fireEvent.click(screen.getByRole('button', { name: 'Reload for the new version' }));
  act(() => jest.advanceTimersByTime(2999));
  expect(reload).not.toHaveBeenCalled();
  act(() => jest.advanceTimersByTime(1));
  expect(reload).toHaveBeenCalledTimes(1);
});
