import { Stack } from 'expo-router';

import { Providers } from '@/components/providers';
import { FirstScreen } from '@/components/shell/first-screen';
import { UpdateNotice } from '@/components/shell/update-notice';
import { ErrorView } from '@/components/ui/error-view';

/**
 * What a page that failed to draw shows instead (expo-router renders a route's
 * exported ErrorBoundary): our error view, with the reason and "Try again".
 * (A screen whose code could not be fetched is caught nearer, in its own
 * place: components/shell/lazy-screen.tsx.)
 */
export function ErrorBoundary({ error, retry }: { error: Error; retry: () => Promise<void> }) {
  return <ErrorView title="This page could not be shown" error={error} onRetry={() => void retry()} />;
}

export default function RootLayout() {
  return (
    <Providers>
      <FirstScreen>
        <Stack screenOptions={{ headerShown: false }} />
      </FirstScreen>
      <UpdateNotice />
    </Providers>
  );
}
