import { ForgotPasswordScreen } from '@/components/password/forgot-password-screen';

export default function ForgotPassword() {
  return <ForgotPasswordScreen />;
}
