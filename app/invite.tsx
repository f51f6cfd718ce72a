import { useLocalSearchParams } from 'expo-router';

import { lazyScreen } from '@/components/shell/lazy-screen';

const InviteScreen = lazyScreen('InviteScreen');

export default function Invite() {
  const { token } = useLocalSearchParams<{ token?: string }>();
  return <InviteScreen token={typeof token === 'string' ? token : undefined} />;
}
