import { Redirect, Slot } from 'expo-router';

import { useMe } from '@/components/auth/api';

// Signed-out pages, one at a time (a Slot, so a page left behind keeps no form in the page);
// someone already signed in goes to the Bench.
export default function AuthLayout() {
  const me = useMe();
  if (me.data) return <Redirect href="/" />;
  return <Slot />;
}
