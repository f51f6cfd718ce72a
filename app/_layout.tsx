import { Stack } from 'expo-router';

import { Providers } from '@/components/providers';
import { UpdateNotice } from '@/components/shell/update-notice';

export { ErrorBoundary } from 'expo-router';

export default function RootLayout() {
  return (
    <Providers>
      <Stack screenOptions={{ headerShown: false }} />
      <UpdateNotice />
    </Providers>
  );
}
