import { zodResolver } from '@hookform/resolvers/zod';
import { useQueryClient } from '@tanstack/react-query';
import { useForm } from 'react-hook-form';
import { StyleSheet, View } from 'react-native';
import { z } from 'zod';

import { isApiError } from '@/components/api/client';
import { authKeys } from '@/components/auth/api';
import { AuthFrame } from '@/components/auth/auth-frame';
import { applyServerErrors } from '@/components/auth/server-errors';
import { useResetPassword } from '@/components/password/api';
import { Banner } from '@/components/ui/banner';
import { Button } from '@/components/ui/button';
import { FormField } from '@/components/ui/form-field';
import { ScreenTitle } from '@/components/ui/screen-title';
import { TextLink } from '@/components/ui/text-link';
import { space } from '@/components/theme';
import { passwordMinLength } from '@/shared/auth';
import { linkTokenSchema } from '@/shared/share';
import { passwordResetSchema } from '@/shared/password';

const formSchema = passwordResetSchema
  .pick({ password: true })
  .extend({ repeat: z.string() })
  .refine((value) => value.password === value.repeat, { path: ['repeat'], message: 'The two passwords are not the same' });
type FormValues = z.infer<typeof formSchema>;

/**
 * The page an e-mailed reset link opens (/reset-password?token=…): choose a
 * new password. Afterwards every session of the account is ended, this one too.
 * Example: `<ResetPasswordScreen token={params.token} />`
 */
export function ResetPasswordScreen({ token }: { token: string | undefined }) {
  const reset = useResetPassword();
  const queryClient = useQueryClient();
  const tokenOk = linkTokenSchema.safeParse(token ?? '').success;
  const { control, handleSubmit, setError, setFocus } = useForm<FormValues>({
    resolver: zodResolver(formSchema),
    defaultValues: { password: '', repeat: '' },
  });
  const submit = handleSubmit(({ password }) => {
    reset.mutate(
      { token: token ?? '', password },
      {
        onSuccess: () => {
          // Every sign-in session of the account has ended on the server; forget who was signed in here.
          queryClient.clear();
          queryClient.setQueryData(authKeys.me, null);
        },
        onError: (error) => applyServerErrors(error, ['password'], setError),
      },
    );
  });

  const linkDead = isApiError(reset.error) && [404, 410].includes(reset.error.status);
  return (
    <>
      <ScreenTitle name="Choose a new password" />
      <AuthFrame
        title="Choose a new password"
        lead="The link from the e-mail works once, for one hour. Choosing a new password signs you out everywhere."
        footer={<TextLink href="/sign-in" label="Back to sign in" />}
      >
        <View style={styles.form}>
          {!tokenOk ? (
            <Banner tone="error" title="This link is not complete">
              Open the link from the e-mail again, or copy the whole address into the browser. You can also ask for a new link.
            </Banner>
          ) : null}
          {reset.isSuccess ? (
            <Banner tone="info" title="Password changed" testID="reset-done" action={<Button label="Sign in" href="/sign-in" />}>
              {reset.data}
            </Banner>
          ) : null}
          {reset.isError && !reset.error.fields.password ? (
            <Banner
              tone="error"
              title="Could not change the password"
              action={linkDead ? <Button label="Ask for a new link" variant="secondary" href="/forgot-password" /> : undefined}
            >
              {reset.error.message}
            </Banner>
          ) : null}
          {!reset.isSuccess && tokenOk ? (
            <>
              <FormField
                control={control}
                name="password"
                label="New password"
                hint={`At least ${passwordMinLength} characters. A short sentence works well.`}
                autoComplete="new-password"
                secureTextEntry
                returnKeyType="next"
                onSubmitEditing={() => setFocus('repeat')}
              />
              <FormField
                control={control}
                name="repeat"
                label="New password again"
                autoComplete="new-password"
                secureTextEntry
                returnKeyType="go"
                onSubmitEditing={submit}
              />
              <Button label="Change the password" pendingLabel="Changing…" pending={reset.isPending} onPress={submit} fullWidth />
            </>
          ) : null}
          {!tokenOk ? <Button label="Ask for a new link" variant="secondary" href="/forgot-password" /> : null}
        </View>
      </AuthFrame>
    </>
  );
}

const styles = StyleSheet.create({
  form: { gap: space.lg },
});
