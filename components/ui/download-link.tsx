import { Linking, StyleSheet, View } from 'react-native';

import { useOnline } from '@/components/offline/use-online';
import { Button } from '@/components/ui/button';
import { Text } from '@/components/ui/text';
import { space } from '@/components/theme';

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
 * Example: `<DownloadLink label="Download SVG" href="/api/sight-ins/4/tape.svg" />`
 */
export function DownloadLink({ label, href, testID }: DownloadLinkProps) {
  const online = useOnline();
  // Every file comes from the server: with no signal, a disabled button that says so.
  if (!online) {
    return (
      <View style={styles.offline}>
        <Button label={label} variant="secondary" disabled testID={testID} />
        <Text variant="small" tone="soft">
          Needs a connection
        </Text>
      </View>
    );
  }
  return <Button label={label} variant="secondary" onPress={() => Linking.openURL(href)} testID={testID} />;
}

const styles = StyleSheet.create({
  offline: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'center', gap: space.sm },
});
