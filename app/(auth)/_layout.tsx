import { Redirect, Stack } from 'expo-router';

import { useMe } from '@/components/auth/api';

// Signed-out pages; someone already signed in goes to the Bench.
export default function AuthLayout() {
  const me = useMe();
  if (me.data) return <Redirect href="/" />;
  return <Stack screenOptions={{ headerShown: false }} />;
}
