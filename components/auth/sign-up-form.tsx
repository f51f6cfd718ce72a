import { zodResolver } from '@hookform/resolvers/zod';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { StyleSheet, View } from 'react-native';

import { isApiError } from '@/components/api/client';
import { useSignUp } from '@/components/auth/api';
import { applyServerErrors } from '@/components/auth/server-errors';
import { Banner } from '@/components/ui/banner';
import { Button } from '@/components/ui/button';
import { FormChoice } from '@/components/ui/form-choice';
import { FormField } from '@/components/ui/form-field';
import { space } from '@/components/theme';
import { passwordMinLength, signUpSchema, type SignUpInput, type User } from '@/shared/auth';
import { emailInputProps } from '@/components/ui/email-input-props';

const unitOptions = [
  { value: 'yd', label: 'Yards' },
  { value: 'm', label: 'Metres' },
] as const;

export interface SignUpFormProps {
  /** Called after the account is made and signed in (the user is already in the useMe cache). */
  onSignedUp?: (user: User) => void;
}

/**
 * Name, e-mail, password and the first unit choice (yards or metres, which
 * sets the account's other units), validated with the shared sign-up schema.
 * A taken e-mail (409) is shown under the e-mail field.
 * Example: `<SignUpForm />`
 */
export function SignUpForm({ onSignedUp }: SignUpFormProps) {
  const signUp = useSignUp();
  const [general, setGeneral] = useState<string | null>(null);
  const { control, handleSubmit, setError, setFocus } = useForm<SignUpInput>({
    resolver: zodResolver(signUpSchema),
    defaultValues: { name: '', email: '', password: '', distanceUnit: 'yd' },
  });

  const submit = handleSubmit((values) => {
    setGeneral(null);
    signUp.mutate(values, {
      onSuccess: (user) => onSignedUp?.(user),
      onError: (error) => {
        if (isApiError(error, 409) && !error.fields.email) {
          setError('email', { type: 'server', message: error.message });
          return;
        }
        setGeneral(applyServerErrors(error, ['name', 'email', 'password', 'distanceUnit'], setError));
      },
    });
  });

  return (
    <View style={styles.form}>
      {general ? (
        <Banner tone="error" title="Could not create the account" testID="sign-up-error">
          {general}
        </Banner>
      ) : null}
      <FormField
        control={control}
        name="name"
        label="Name"
        hint="Shown to a technician you share a bow with."
        autoComplete="name"
        returnKeyType="next"
        onSubmitEditing={() => setFocus('email')}
      />
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
        hint={`At least ${passwordMinLength} characters. A short sentence works well.`}
        autoComplete="new-password"
        secureTextEntry
        returnKeyType="go"
        onSubmitEditing={submit}
      />
      <FormChoice
        control={control}
        name="distanceUnit"
        label="You shoot in"
        hint="Yards: lengths in inches, altitude in feet, °F, fps. Metres: mm, metres, °C, m/s. Arrow weights in grains either way; change any of them later on your account page."
        options={unitOptions}
        testID="sign-up-units"
      />
      <Button label="Create account" pendingLabel="Creating account…" pending={signUp.isPending} onPress={submit} fullWidth />
    </View>
  );
}

const styles = StyleSheet.create({
  form: { gap: space.lg },
});
