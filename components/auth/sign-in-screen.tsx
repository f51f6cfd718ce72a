import { AuthFrame } from '@/components/auth/auth-frame';
import { SignInForm } from '@/components/auth/sign-in-form';
import { PRODUCT_LEAD } from '@/components/shell/product-lead';
import { Button } from '@/components/ui/button';
import { TextLink } from '@/components/ui/text-link';
import { ScreenTitle } from '@/components/ui/screen-title';

/** The sign-in page. Once signed in, the (auth) layout sends the archer to the Bench. */
export function SignInScreen() {
  return (
    <>
      <ScreenTitle name="Sign in" />
      <AuthFrame
        title="Sign in"
        lead={PRODUCT_LEAD}
        footer={
          <>
            <TextLink href="/forgot-password" label="Forgot your password?" />
            <TextLink href="/sign-up" label="New here? Create an account" />
            <Button label="Try a tape without an account" variant="secondary" href="/try" testID="sign-in-try" />
          </>
        }
      >
        <SignInForm />
      </AuthFrame>
    </>
  );
}
