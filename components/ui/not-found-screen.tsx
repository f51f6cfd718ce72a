import { Stack } from 'expo-router';

import { Button } from '@/components/ui/button';
import { EmptyState } from '@/components/ui/empty-state';
import { Screen } from '@/components/ui/screen';
import { screenTitle } from '@/components/ui/screen-title';

/** Shown for an address that matches no page. */
export function NotFoundScreen() {
  return (
    <Screen centered width="form">
      <Stack.Screen options={{ title: screenTitle('Page not found') }} />
      <EmptyState
        title="There is no page here"
        message="The address may be mistyped, or the page has moved."
        action={<Button label="Go to the bench" href="/" />}
      />
    </Screen>
  );
}
