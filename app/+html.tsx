import { ScrollViewStyleReset } from 'expo-router/html';
import type { PropsWithChildren } from 'react';

import { colors } from '@/components/theme';

// Used when the web export pre-renders pages (web.output "static"); the "single"
// output uses Expo's default page, which sets the same viewport and reset.
export default function Root({ children }: PropsWithChildren) {
  return (
    <html lang="en">
      <head>
        <meta charSet="utf-8" />
        <meta httpEquiv="X-UA-Compatible" content="IE=edge" />
        <meta name="viewport" content="width=device-width, initial-scale=1, viewport-fit=cover" />
        <meta name="theme-color" content={colors.slate} />
        <ScrollViewStyleReset />
        <style>{`html, body { background-color: ${colors.paper}; }`}</style>
      </head>
      <body>{children}</body>
    </html>
  );
}
