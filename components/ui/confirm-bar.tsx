import { StyleSheet, View } from 'react-native';

import { Banner } from '@/components/ui/banner';
import { Button } from '@/components/ui/button';
import { space } from '@/components/theme';

export interface ConfirmBarProps {
  /** The question, e.g. "Delete Ridge slider?". */
  title: string;
  /** What will be lost, in plain words. */
  message: string;
  /** Label of the destructive button, e.g. "Delete for good". */
  confirmLabel: string;
  pendingLabel?: string;
  pending?: boolean;
  /** A failure to show under the message. */
  error?: string | null;
  onConfirm: () => void;
  onCancel: () => void;
  testID?: string;
}

/**
 * An inline "are you sure" for destructive actions: works the same on every
 * platform (no browser dialog), keeps focus in the page, names what is lost.
 * Example: `{asking ? <ConfirmBar title="Delete this bow?" message="…" confirmLabel="Delete" onConfirm={del} onCancel={() => setAsking(false)} /> : null}`
 */
export function ConfirmBar({
  title,
  message,
  confirmLabel,
  pendingLabel,
  pending = false,
  error,
  onConfirm,
  onCancel,
  testID,
}: ConfirmBarProps) {
  return (
    <Banner
      tone="warn"
      title={title}
      testID={testID}
      action={
        <View style={styles.actions}>
          <Button label={confirmLabel} pendingLabel={pendingLabel} pending={pending} variant="danger" onPress={onConfirm} />
          <Button label="Keep it" variant="secondary" onPress={onCancel} disabled={pending} />
        </View>
      }
    >
      {error ? `${message}\n\n${error}` : message}
    </Banner>
  );
}

const styles = StyleSheet.create({
  actions: { flexDirection: 'row', flexWrap: 'wrap', gap: space.md },
});
