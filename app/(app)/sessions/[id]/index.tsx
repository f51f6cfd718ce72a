import { useLocalSearchParams } from 'expo-router';

import { SessionScreen } from '@/components/sessions/session-screen';

export default function Session() {
  const { id } = useLocalSearchParams<{ id: string }>();
  return <SessionScreen sessionId={Number(id)} />;
}
