import { QueryClient, QueryClientProvider } from '@tanstack/react-query';
import { render } from '@testing-library/react';
import type { ReactElement } from 'react';

/** A fresh QueryClient (no retries, so failures show at once) around the element. */
export function renderWithClient(element: ReactElement) {
  const queryClient = new QueryClient({
    defaultOptions: { queries: { retry: false }, mutations: { retry: false } },
  });
  const utils = render(<QueryClientProvider client={queryClient}>{element}</QueryClientProvider>);
  return { ...utils, queryClient };
}

/** A minimal fetch Response: JSON body (or none), status and content type. */
export function jsonResponse(status: number, body?: unknown) {
  return {
    ok: status >= 200 && status < 300,
    status,
    headers: {
      get: (name: string) => (name.toLowerCase() === 'content-type' && body !== undefined ? 'application/json; charset=utf-8' : null),
    },
    json: async () => body,
  };
}

/** Replaces global fetch with a jest mock for the test; returns the mock. */
export function mockFetch() {
  const fetchMock = jest.fn();
  (globalThis as { fetch: unknown }).fetch = fetchMock;
  return fetchMock;
}
