import { useRouter } from 'expo-router';
import { useState } from 'react';
import { StyleSheet, View } from 'react-native';

import { useDeleteAccount } from '@/components/account/api';
import { Banner } from '@/components/ui/banner';
import { Button } from '@/components/ui/button';
import { Text } from '@/components/ui/text';
import { TextField } from '@/components/ui/text-field';
import { space } from '@/components/theme';

/**
 * Deleting the account: first a plain statement of what goes and what stays,
 * then the password typed again and a last button. Nothing is deleted until
 * the password is right; afterwards the app is signed out.
 * Example: `<DeleteAccount />`
 */
export function DeleteAccount() {
  const router = useRouter();
  const remove = useDeleteAccount();
  const [asking, setAsking] = useState(false);
  const [password, setPassword] = useState('');
  const [error, setError] = useState<string | undefined>(undefined);

  const confirm = () => {
    if (!password) {
      setError('Enter your password to delete the account');
      return;
    }
    setError(undefined);
    remove.mutate(
      { password },
      {
        onSuccess: () => router.replace('/sign-in'),
        onError: (failure) => setError(failure.fields?.password ?? failure.message),
      },
    );
  };

  if (!asking) {
    return (
      <View style={styles.group}>
        <Text tone="soft">
          Deletes your bows and every record on them (builds, sight-ins, tapes, level checks, photos) and ends your shares. Marks and checks
          you added to other archers’ bows stay with them, shown as by “a former account”. Download everything first if you want a copy.
        </Text>
        <View style={styles.row}>
          <Button label="Delete my account…" variant="danger" onPress={() => setAsking(true)} testID="account-delete-start" />
        </View>
      </View>
    );
  }
  return (
    <View style={styles.group} testID="account-delete-confirm">
      <Banner tone="caution" title="Delete the account for good?">
        Your bows, their records and photos are removed at once and cannot be brought back. Type your password to go ahead.
      </Banner>
      <TextField
        label="Your password"
        value={password}
        onChangeText={setPassword}
        secureTextEntry
        autoComplete="current-password"
        error={error}
        testID="account-delete-password"
        onSubmitEditing={confirm}
      />
      <View style={styles.row}>
        <Button
          label="Delete everything"
          pendingLabel="Deleting…"
          pending={remove.isPending}
          variant="danger"
          onPress={confirm}
          testID="account-delete-confirm-button"
        />
        <Button
          label="Keep my account"
          variant="secondary"
          disabled={remove.isPending}
          onPress={() => {
            setAsking(false);
            setPassword('');
            setError(undefined);
          }}
        />
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  group: { gap: space.md },
  row: { flexDirection: 'row', flexWrap: 'wrap', gap: space.sm },
});
