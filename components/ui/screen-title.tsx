import { Stack, useIsFocused } from 'expo-router';
import Head from 'expo-router/head';

/**
 * The browser tab title for a screen: "<name> · Pinwright".
 * Example: `screenTitle('Bench')` → "Bench · Pinwright"
 */
export function screenTitle(name: string): string {
  return `${name} · Pinwright`;
}

/**
 * Sets a screen's title: the navigator's option and, while the screen is in
 * front, the browser tab's title "<name> · Pinwright" (expo-router leaves
 * document titles to its Head component).
 * Prefer this to a bare `<Stack.Screen options={{ title }} />`, which leaves the tab title unchanged.
 * Example: `<ScreenTitle name="Bench" />`
 */
export function ScreenTitle({ name }: { name: string }) {
  const focused = useIsFocused();
  const title = screenTitle(name);
  return (
    <>
      <Stack.Screen options={{ title }} />
      {focused ? (
        <Head>
          <title>{title}</title>
        </Head>
      ) : null}
    </>
  );
}
