import { zodResolver } from '@hookform/resolvers/zod';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { StyleSheet, View } from 'react-native';

import { useChangePassword } from '@/components/account/api';
import { applyServerErrors } from '@/components/auth/server-errors';
import { Banner } from '@/components/ui/banner';
import { Button } from '@/components/ui/button';
import { FormField } from '@/components/ui/form-field';
import { space } from '@/components/theme';
import { passwordChangeSchema, type PasswordChange } from '@/shared/account';
import { passwordMinLength } from '@/shared/auth';

/**
 * The current password and a new one. On success every other sign-in of the
 * account ends (a phone left signed in somewhere is signed out) and this one stays.
 * Example: `<PasswordChangeForm />`
 */
export function PasswordChangeForm() {
  const change = useChangePassword();
  const [general, setGeneral] = useState<string | null>(null);
  const { control, handleSubmit, setError, reset, setFocus } = useForm<PasswordChange>({
    resolver: zodResolver(passwordChangeSchema),
    defaultValues: { currentPassword: '', newPassword: '' },
  });
  const submit = handleSubmit((values) => {
    setGeneral(null);
    change.mutate(values, {
      onSuccess: () => reset(),
      onError: (error) => setGeneral(applyServerErrors(error, ['currentPassword', 'newPassword'], setError)),
    });
  });
  return (
    <View style={styles.form} testID="password-change">
      {general ? (
        <Banner tone="error" title="Could not change the password">
          {general}
        </Banner>
      ) : null}
      {change.isSuccess ? (
        <Banner tone="info" title="Saved" testID="password-changed">
          {change.data.message}
        </Banner>
      ) : null}
      <FormField
        control={control}
        name="currentPassword"
        label="Current password"
        autoComplete="current-password"
        secureTextEntry
        returnKeyType="next"
        onSubmitEditing={() => setFocus('newPassword')}
      />
      <FormField
        control={control}
        name="newPassword"
        label="New password"
        hint={`At least ${passwordMinLength} characters. Your other sign-ins end; this one stays.`}
        autoComplete="new-password"
        secureTextEntry
        returnKeyType="go"
        onSubmitEditing={submit}
      />
      <View style={styles.actions}>
        <Button
          label="Change the password"
          pendingLabel="Changing…"
          pending={change.isPending}
          onPress={submit}
          testID="password-change-save"
        />
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  form: { gap: space.lg },
  actions: { flexDirection: 'row' },
});
