import { QueryClient, QueryClientProvider } from '@tanstack/react-query';
import { ThemeProvider, type Theme as NavigationTheme, DefaultTheme } from 'expo-router';
import { useState, type ReactNode } from 'react';
import { StyleSheet, View } from 'react-native';

import { isApiError } from '@/components/api/client';
import { reportNoNetwork } from '@/components/offline/connectivity';
import { OfflineNotice } from '@/components/offline/offline-notice';
import { OfflineProvider } from '@/components/offline/offline-provider';
import { colors, fonts } from '@/components/theme';

const navigationTheme: NavigationTheme = {
  ...DefaultTheme,
  colors: {
    ...DefaultTheme.colors,
    primary: colors.signal,
    background: colors.paper,
    card: colors.surface,
    text: colors.ink,
    border: colors.line,
    notification: colors.signal,
  },
  fonts: {
    regular: { fontFamily: fonts.body, fontWeight: 'normal' },
    medium: { fontFamily: fonts.body, fontWeight: 'normal' },
    bold: { fontFamily: fonts.bold, fontWeight: 'normal' },
    heavy: { fontFamily: fonts.bold, fontWeight: 'normal' },
  },
};

/**
 * Retry network and server failures twice; never retry a 4xx (it will fail the
 * same way). A failure for want of a network marks the app offline, so the
 * retry waits for the signal (react-query pauses it) and the screen keeps the
 * records this phone already has instead of an error.
 */
function shouldRetry(failureCount: number, error: unknown): boolean {
  if (isApiError(error) && error.status >= 400 && error.status < 500) return false;
  if (isApiError(error) && error.status === 0) reportNoNetwork();
  if (isApiError(error) && error.code === 'bad_response') return false;
  return failureCount < 2;
}

/** Builds the app's QueryClient (exported for tests that need the same defaults). */
export function createQueryClient(): QueryClient {
  return new QueryClient({
    defaultOptions: {
      // Never dropped from memory: a query dropped there would drop from the device's copy too (kept cacheMaxAgeMs).
      // Infinity, not 30 days: a timer beyond 2^31 − 1 ms (24.8 days) fires at once in browsers (HTML timers spec).
      queries: { retry: shouldRetry, staleTime: 30_000, refetchOnWindowFocus: false, gcTime: Infinity },
      // 'always': a write with no signal runs at once (and is kept in the outbox, or fails with a plain message), never hangs paused.
      mutations: { retry: false, networkMode: 'always' },
    },
  });
}

/**
 * Everything the app needs above the router's screens: one QueryClient (its
 * cache kept on the device per account, and the outbox of offline writes:
 * components/offline) and the navigation theme in Pinwright's colours. The
 * fonts are the page's own (@font-face rules and preloads written into
 * index.html by server/tools/web-pwa.ts), so nothing here waits for them.
 * The offline notice and the outbox sit above every screen.
 */
export function Providers({ children }: { children: ReactNode }) {
  const [queryClient] = useState(createQueryClient);

  return (
    <QueryClientProvider client={queryClient}>
      <OfflineProvider queryClient={queryClient}>
        <ThemeProvider value={navigationTheme}>
          <View style={styles.root}>
            <OfflineNotice />
            <View style={styles.screens}>{children}</View>
          </View>
        </ThemeProvider>
      </OfflineProvider>
    </QueryClientProvider>
  );
}

const styles = StyleSheet.create({
  root: { flex: 1, backgroundColor: colors.paper },
  screens: { flex: 1 },
});
