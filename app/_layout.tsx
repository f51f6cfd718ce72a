import { Stack } from 'expo-router';

import { Providers } from '@/components/providers';

export { ErrorBoundary } from 'expo-router';

export default function RootLayout() {
  return (
    <Providers>
      <Stack screenOptions={{ headerShown: false }} />
    </Providers>
  );
}
