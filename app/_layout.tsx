import { Stack } from 'expo-router';

import { Providers } from '@/components/providers';
import { FirstScreen } from '@/components/shell/first-screen';
import { UpdateNotice } from '@/components/shell/update-notice';

export { ErrorBoundary } from 'expo-router';

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
