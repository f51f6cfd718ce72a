import { ScrollViewStyleReset } from 'expo-router/html';
import type { PropsWithChildren } from 'react';

import { colors } from '@/components/theme';

// Used when the web export pre-renders pages (web.output "static"); the "single"
// output uses Expo's default page, which sets the same viewport and reset, and
// server/tools/web-pwa.ts adds the same manifest, icon and colour tags to it.
export default function Root({ children }: PropsWithChildren) {
  return (
    <html lang="en">
      <head>
        <meta charSet="utf-8" />
        <meta httpEquiv="X-UA-Compatible" content="IE=edge" />
        <meta name="viewport" content="width=device-width, initial-scale=1, viewport-fit=cover" />
        <meta name="theme-color" content={colors.slate} />
        <meta name="description" content="Sight tapes, sight-ins and level checks for compound bows." />
        <link rel="manifest" href="/manifest.webmanifest" />
        <link rel="apple-touch-icon" href="/icons/apple-touch-icon.png" />
        <ScrollViewStyleReset />
        <style>{`html, body { background-color: ${colors.paper}; }`}</style>
      </head>
      <body>{children}</body>
    </html>
  );
}
