import { Button } from '@/components/ui/button';
import { EmptyState } from '@/components/ui/empty-state';
import { Screen } from '@/components/ui/screen';
import { ScreenTitle } from '@/components/ui/screen-title';

/** Shown for an address that matches no page. */
export function NotFoundScreen() {
  return (
    <Screen centered width="form">
      <ScreenTitle name="Page not found" />
      <EmptyState
        title="There is no page here"
        message="The address may be mistyped, or the page has moved."
        action={<Button label="Go to the bench" href="/" />}
      />
    </Screen>
  );
}
