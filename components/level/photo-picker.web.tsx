import { useRef, type ChangeEvent } from 'react';
import { Image, StyleSheet, View } from 'react-native';

import { bigTap } from '@/components/level/result-buttons';
import type { PhotoPickerProps } from '@/components/level/photo-picker';
import { Button } from '@/components/ui/button';
import { Text } from '@/components/ui/text';
import { radii, space } from '@/components/theme';

// The web build uses a plain <input type="file"> (phones offer the camera or the
// gallery); the server checks the file's content, so `accept` is only a hint.

/** A step's optional photo on the web: a large "Add a photo" button over a hidden file input. */
export function PhotoPicker({ photo, onPick, onRemove, pending = false, error, disabled = false, testID }: PhotoPickerProps) {
  const input = useRef<HTMLInputElement | null>(null);
  const chosen = (event: ChangeEvent<HTMLInputElement>) => {
    const file = event.target.files?.[0];
    event.target.value = '';
    if (file) onPick(file, file.name);
  };
  return (
    <View style={styles.box} testID={testID}>
      <Text variant="label">Photo (optional)</Text>
      <Text variant="small" tone="soft">
        A JPEG, PNG or WebP picture of the level or the bubble, up to 5 MB.
      </Text>
      {photo ? (
        <Image
          source={{ uri: photo.url }}
          style={styles.image}
          accessibilityLabel="Photo of this step"
          testID={testID ? `${testID}-image` : undefined}
        />
      ) : null}
      <input
        ref={input}
        type="file"
        accept="image/jpeg,image/png,image/webp"
        onChange={chosen}
        style={{ display: 'none' }}
        data-testid={testID ? `${testID}-input` : undefined}
        aria-hidden
        tabIndex={-1}
      />
      <View style={styles.actions}>
        <Button
          label={photo ? 'Replace the photo' : 'Add a photo'}
          pendingLabel="Uploading…"
          pending={pending}
          disabled={disabled}
          variant="secondary"
          onPress={() => input.current?.click()}
          style={styles.big}
          testID={testID ? `${testID}-add` : undefined}
        />
        {photo ? <Button label="Remove" variant="quiet" onPress={onRemove} disabled={disabled || pending} style={styles.big} /> : null}
      </View>
      {error ? (
        <Text variant="small" tone="failed" role="alert">
          {error}
        </Text>
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  box: { gap: space.sm },
  image: { width: '100%', maxWidth: 360, aspectRatio: 4 / 3, borderRadius: radii.md, resizeMode: 'cover' },
  actions: { flexDirection: 'row', flexWrap: 'wrap', gap: space.sm },
  big: { minHeight: bigTap },
});
