import { Redirect, Slot } from 'expo-router';

import { useMe } from '@/components/auth/api';
import { AppShell } from '@/components/shell/app-shell';
import { ErrorView } from '@/components/ui/error-view';
import { LoadingView } from '@/components/ui/loading-view';

export const unstable_settings = { initialRouteName: 'index' };

// The one sign-in gate for every signed-in page. A Slot keeps the back stack but
// renders only the page in front, so pages left behind leave nothing in the DOM.
export default function SignedInLayout() {
  const me = useMe();
  if (me.isPending) return <LoadingView label="Opening your bench…" />;
  if (me.isError) {
    return (
      <ErrorView
        title="Pinwright could not check who is signed in"
        error={me.error}
        onRetry={() => me.refetch()}
        retrying={me.isFetching}
      />
    );
  }
  if (!me.data) return <Redirect href="/sign-in" />;
  return (
    <AppShell user={me.data}>
      <Slot />
    </AppShell>
  );
}
