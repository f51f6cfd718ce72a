import { zodResolver } from '@hookform/resolvers/zod';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { StyleSheet, View } from 'react-native';

import { useSignIn } from '@/components/auth/api';
import { applyServerErrors } from '@/components/auth/server-errors';
import { Banner } from '@/components/ui/banner';
import { Button } from '@/components/ui/button';
import { FormField } from '@/components/ui/form-field';
import { space } from '@/components/theme';
import { signInSchema, type SignInInput, type User } from '@/shared/auth';
import { emailInputProps } from '@/components/ui/email-input-props';

export interface SignInFormProps {
  /** Called after a successful sign-in (the user is already in the useMe cache). */
  onSignedIn?: (user: User) => void;
}

/**
 * E-mail and password, validated with the shared sign-in schema; server field
 * messages go under their field, anything else into an error banner.
 * Example: `<SignInForm />`
 */
export function SignInForm({ onSignedIn }: SignInFormProps) {
  const signIn = useSignIn();
  const [general, setGeneral] = useState<string | null>(null);
  const { control, handleSubmit, setError, setFocus } = useForm<SignInInput>({
    resolver: zodResolver(signInSchema),
    defaultValues: { email: '', password: '' },
  });

  const submit = handleSubmit((values) => {
    setGeneral(null);
    signIn.mutate(values, {
      onSuccess: (user) => onSignedIn?.(user),
      onError: (error) => setGeneral(applyServerErrors(error, ['email', 'password'], setError)),
    });
  });

  return (
    <View style={styles.form}>
      {general ? (
        <Banner tone="error" title="Could not sign in" testID="sign-in-error">
          {general}
        </Banner>
      ) : null}
      <FormField
        control={control}
        name="email"
        label="E-mail"
        {...emailInputProps}
        returnKeyType="next"
        onSubmitEditing={() => setFocus('password')}
      />
      <FormField
        control={control}
        name="password"
        label="Password"
        autoComplete="current-password"
        secureTextEntry
        returnKeyType="go"
        onSubmitEditing={submit}
      />
      <Button label="Sign in" pendingLabel="Signing in…" pending={signIn.isPending} onPress={submit} fullWidth />
    </View>
  );
}

const styles = StyleSheet.create({
  form: { gap: space.lg },
});
