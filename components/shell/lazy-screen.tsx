import { Component, lazy, Suspense, useReducer, type ComponentProps, type ComponentType, type ReactNode } from 'react';

import { ErrorView } from '@/components/ui/error-view';
import { LoadingView } from '@/components/ui/loading-view';

type Screens = typeof import('./workshop-screens');

let loading: Promise<Screens> | undefined;

/**
 * Loads the workshop screens (once; again after a failure, so a retry can
 * succeed). The one `import()` of components/shell/workshop-screens.ts.
 */
export function loadWorkshopScreens(): Promise<Screens> {
  loading ??= import('./workshop-screens').catch((error: unknown) => {
    loading = undefined;
    throw error;
  });
  return loading;
}

/** A load of the screens' code that failed (Expo's web loader names these AsyncRequireError). */
function isCodeFetchError(error: unknown): boolean {
  return (error as { name?: unknown } | null)?.name === 'AsyncRequireError';
}

/**
 * Catches a failed load of the screens' code (no signal, and the app not yet
 * stored for offline use) where the page goes, so the app's frame stays, and
 * offers to load it again. Any other error goes on to the router's boundary.
 */
class LoadFailed extends Component<{ onRetry: () => void; children: ReactNode }, { error: unknown }> {
  state = { error: undefined as unknown };

  static getDerivedStateFromError(error: unknown) {
    return { error };
  }

  render() {
    const { error } = this.state;
    if (error === undefined) return this.props.children;
    if (!isCodeFetchError(error)) throw error;
    return (
      <ErrorView
        title="This page could not be opened"
        error={new Error('Pinwright could not fetch this page. Check your signal, then try again.')}
        onRetry={() => {
          this.props.onRetry();
          this.setState({ error: undefined });
        }}
      />
    );
  }
}

/**
 * A screen from workshop-screens.ts that is fetched the first time it is
 * shown (the service worker has usually stored it by then), with a quiet
 * "Opening…" meanwhile. A failed fetch shows "This page could not be opened"
 * with "Try again" in the page's place.
 * Example (in a route file): `const CompareScreen = lazyScreen('CompareScreen');`
 */
export function lazyScreen<K extends keyof Screens>(name: K): Screens[K] {
  type Props = ComponentProps<Screens[K] & ComponentType<any>>;
  // React.lazy keeps a failed load's error for good, so a failure leaves a fresh
  // one in its place for the next try.
  const fresh = (): ComponentType<Props> =>
    lazy(() =>
      loadWorkshopScreens().then(
        (screens) => ({ default: screens[name] as ComponentType<Props> }),
        (error: unknown) => {
          current = fresh();
          throw error;
        },
      ),
    );
  let current = fresh();
  function LazyScreen(props: Props) {
    const [, tryAgain] = useReducer((tries: number) => tries + 1, 0);
    const Lazy = current;
    return (
      <LoadFailed onRetry={tryAgain}>
        <Suspense fallback={<LoadingView label="Opening…" />}>
          <Lazy {...props} />
        </Suspense>
      </LoadFailed>
    );
  }
  LazyScreen.displayName = `Lazy(${String(name)})`;
  return LazyScreen as unknown as Screens[K];
}
