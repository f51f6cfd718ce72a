import { AuthFrame } from '@/components/auth/auth-frame';
import { SignUpForm } from '@/components/auth/sign-up-form';
import { TextLink } from '@/components/ui/text-link';
import { ScreenTitle } from '@/components/ui/screen-title';

/** The sign-up page. Once the account exists, the (auth) layout sends the archer to the Bench. */
export function SignUpScreen() {
  return (
    <>
      <ScreenTitle name="Create an account" />
      <AuthFrame
        title="Create an account"
        lead="Your records stay yours. You share a bow with a technician only when you choose."
        footer={
          <>
            <TextLink href="/sign-in" label="Have an account? Sign in" />
            <TextLink href="/try" label="Try a tape without an account" />
          </>
        }
      >
        <SignUpForm />
      </AuthFrame>
    </>
  );
}
