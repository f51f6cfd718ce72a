import { useLocalSearchParams } from 'expo-router';

import { lazyScreen } from '@/components/shell/lazy-screen';

const SessionScreen = lazyScreen('SessionScreen');

export default function Session() {
  const { id } = useLocalSearchParams<{ id: string }>();
  return <SessionScreen sessionId={Number(id)} />;
}
