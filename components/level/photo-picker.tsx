import { Image, StyleSheet, View } from 'react-native';

import { Button } from '@/components/ui/button';
import { Text } from '@/components/ui/text';
import { radii, space } from '@/components/theme';
import type { Photo } from '@/shared/level';

export interface PhotoPickerProps {
  /** The step's current photo. */
  photo: Photo | null;
  /** Called with the chosen file (the caller uploads it). */
  onPick: (file: Blob, fileName: string) => void;
  onRemove: () => void;
  pending?: boolean;
  error?: string | null;
  disabled?: boolean;
  testID?: string;
}

/**
 * A step's optional photo. On a phone app this would open the camera roll; the
 * app ships for the web only today, so here it shows the photo and says where to
 * add one (the web version, photo-picker.web.tsx, has the file picker).
 */
export function PhotoPicker({ photo, onRemove, pending = false, disabled = false, testID }: PhotoPickerProps) {
  return (
    <View style={styles.box} testID={testID}>
      <Text variant="label">Photo (optional)</Text>
      {photo ? <Image source={{ uri: photo.url }} style={styles.image} accessibilityLabel="Photo of this step" /> : null}
      {photo ? <Button label="Remove the photo" variant="quiet" onPress={onRemove} pending={pending} disabled={disabled} /> : null}
      {!photo ? (
        <Text variant="small" tone="soft">
          Photos can be added from Pinwright in a web browser.
        </Text>
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  box: { gap: space.sm },
  image: { width: '100%', maxWidth: 360, aspectRatio: 4 / 3, borderRadius: radii.md, resizeMode: 'cover' },
});
