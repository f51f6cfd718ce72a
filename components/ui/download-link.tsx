import { Linking } from 'react-native';

import { Button } from '@/components/ui/button';

export interface DownloadLinkProps {
  label: string;
  /** The file's address (an API path). */
  href: string;
  /** Suggested file name. */
  fileName?: string;
  testID?: string;
}

// Native apps hand the address to the system (which downloads or opens it); the web
// build uses download-link.web.tsx, a real <a download> so the browser saves the file.
/**
 * A secondary-looking button that downloads a file.
 * Example: `<DownloadLink label="Download SVG" href="/api/sessions/4/tape.svg" />`
 */
export function DownloadLink({ label, href, testID }: DownloadLinkProps) {
  return <Button label={label} variant="secondary" onPress={() => Linking.openURL(href)} testID={testID} />;
}
