import { lazy, Suspense, type ComponentProps, type ComponentType } from 'react';

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

/**
 * A screen from workshop-screens.ts that is fetched the first time it is
 * shown (the service worker has usually stored it by then), with a quiet
 * "Opening…" meanwhile. A failed load reaches the router's ErrorBoundary.
 * Example (in a route file): `const CompareScreen = lazyScreen('CompareScreen');`
 */
export function lazyScreen<K extends keyof Screens>(name: K): Screens[K] {
  type Props = ComponentProps<Screens[K] & ComponentType<any>>;
  const Lazy = lazy(() => loadWorkshopScreens().then((screens) => ({ default: screens[name] as ComponentType<Props> })));
  function LazyScreen(props: Props) {
    return (
      <Suspense fallback={<LoadingView label="Opening…" />}>
        <Lazy {...props} />
      </Suspense>
    );
  }
  LazyScreen.displayName = `Lazy(${String(name)})`;
  return LazyScreen as unknown as Screens[K];
}
