import { StyleSheet, View } from 'react-native';

import { Banner } from '@/components/ui/banner';
import { Button } from '@/components/ui/button';
import { layout, space } from '@/components/theme';

export interface ErrorViewProps {
  /** What failed, in plain words, e.g. "Your bench could not be loaded". */
  title: string;
  /** The error (its message is shown when it has one). */
  error?: unknown;
  /** Shows a "Try again" button. */
  onRetry?: () => void;
  /** True while the retry is running. */
  retrying?: boolean;
}

/**
 * A failed screen: an error banner with the reason and an optional retry.
 * Example: `if (bows.isError) return <ErrorView title="Your bench could not be loaded" error={bows.error} onRetry={bows.refetch} />;`
 */
export function ErrorView({ title, error, onRetry, retrying = false }: ErrorViewProps) {
  const message = error instanceof Error && error.message ? error.message : 'Something went wrong.';
  return (
    <View style={styles.box}>
      <View style={styles.column}>
        <Banner
          tone="error"
          title={title}
          action={
            onRetry ? (
              <Button label="Try again" pendingLabel="Trying again…" pending={retrying} variant="secondary" onPress={onRetry} />
            ) : undefined
          }
        >
          {message}
        </Banner>
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  box: { flex: 1, alignItems: 'center', justifyContent: 'center', padding: space.lg },
  column: { width: '100%', maxWidth: layout.formMax + 120 },
});
