import { useLocalSearchParams } from 'expo-router';

import { InviteScreen } from '@/components/shares/invite-screen';

export default function Invite() {
  const { token } = useLocalSearchParams<{ token?: string }>();
  return <InviteScreen token={typeof token === 'string' ? token : undefined} />;
}
