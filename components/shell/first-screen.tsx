import { startTransition, useEffect, useState, type ReactNode } from 'react';
import { Platform } from 'react-native';

/** The static first screen that server/tools/web-export.ts puts into index.html. */
export const FIRST_PAINT_ID = 'pw-first-paint';

/**
 * Renders the router's first screen as a transition, then removes the static
 * first screen of index.html. A transition lets React render in slices and
 * answer taps in between (React docs, `startTransition`), instead of one long
 * block of the main thread while the whole first screen is built on a slow
 * phone. Native has no static first screen and renders at once.
 * Example: `<FirstScreen><Stack /></FirstScreen>` in app/_layout.tsx.
 */
export function FirstScreen({ children }: { children: ReactNode }) {
  const [ready, setReady] = useState(Platform.OS !== 'web');

  useEffect(() => {
    if (!ready) startTransition(() => setReady(true));
    else if (typeof document !== 'undefined') document.getElementById(FIRST_PAINT_ID)?.remove();
  }, [ready]);

  return ready ? <>{children}</> : null;
}
