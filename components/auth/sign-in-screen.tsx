
import { AuthFrame } from '@/components/auth/auth-frame';
import { SignInForm } from '@/components/auth/sign-in-form';
import { TextLink } from '@/components/ui/text-link';
import { ScreenTitle } from '@/components/ui/screen-title';

/** The sign-in page. Once signed in, the (auth) layout sends the archer to the Bench. */
export function SignInScreen() {
  return (
    <>
      <ScreenTitle name="Sign in" />
      <AuthFrame
        title="Sign in"
        lead="Welcome back to your bench."
        footer={
          <>
            <TextLink href="/forgot-password" label="Forgot your password?" />
            <TextLink href="/sign-up" label="New here? Create an account" />
            <TextLink href="/try" label="Try a tape without an account" />
          </>
        }
      >
        <SignInForm />
      </AuthFrame>
    </>
  );
}
