import { useLocalSearchParams } from 'expo-router';

import { ResetPasswordScreen } from '@/components/password/reset-password-screen';

export default function ResetPassword() {
  const { token } = useLocalSearchParams<{ token?: string }>();
  return <ResetPasswordScreen token={typeof token === 'string' ? token : undefined} />;
}
