import { SignUpScreen } from '@/components/auth/sign-up-screen';

export default function SignUp() {
  return <SignUpScreen />;
}
