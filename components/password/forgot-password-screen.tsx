import { zodResolver } from '@hookform/resolvers/zod';
import { useForm } from 'react-hook-form';
import { StyleSheet, View } from 'react-native';

import { AuthFrame } from '@/components/auth/auth-frame';
import { applyServerErrors } from '@/components/auth/server-errors';
import { useForgotPassword } from '@/components/password/api';
import { Banner } from '@/components/ui/banner';
import { Button } from '@/components/ui/button';
import { FormField } from '@/components/ui/form-field';
import { ScreenTitle } from '@/components/ui/screen-title';
import { TextLink } from '@/components/ui/text-link';
import { space } from '@/components/theme';
import { passwordForgotSchema, type PasswordForgot } from '@/shared/password';
import { emailInputProps } from '@/components/ui/email-input-props';

/**
 * "Forgot password": the e-mail address to send a reset link to. The answer
 * is the same whether or not an account uses the address.
 */
export function ForgotPasswordScreen() {
  const forgot = useForgotPassword();
  const { control, handleSubmit, setError } = useForm<PasswordForgot>({
    resolver: zodResolver(passwordForgotSchema),
    defaultValues: { email: '' },
  });
  const submit = handleSubmit((values) => {
    forgot.mutate(values, { onError: (error) => applyServerErrors(error, ['email'], setError) });
  });

  return (
    <>
      <ScreenTitle name="Forgot password" />
      <AuthFrame
        title="Forgot your password?"
        lead="Enter the address you sign in with. We will e-mail you a link to choose a new password."
        footer={<TextLink href="/sign-in" label="Back to sign in" />}
      >
        <View style={styles.form}>
          {forgot.isSuccess ? (
            <Banner tone="info" title="Check your e-mail" testID="forgot-sent">
              {forgot.data}
            </Banner>
          ) : null}
          {forgot.isError && !forgot.error.fields.email ? (
            <Banner tone="error" title="Could not send the link">
              {forgot.error.message}
            </Banner>
          ) : null}
          <FormField control={control} name="email" label="E-mail" {...emailInputProps} returnKeyType="send" onSubmitEditing={submit} />
          <Button
            label={forgot.isSuccess ? 'Send another link' : 'Send the link'}
            pendingLabel="Sending…"
            pending={forgot.isPending}
            onPress={submit}
            fullWidth
          />
        </View>
      </AuthFrame>
    </>
  );
}

const styles = StyleSheet.create({
  form: { gap: space.lg },
});
