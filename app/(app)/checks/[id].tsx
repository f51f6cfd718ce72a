import { useLocalSearchParams } from 'expo-router';

import { CheckScreen } from '@/components/level/check-screen';

export default function LevelCheck() {
  const { id } = useLocalSearchParams<{ id: string }>();
  return <CheckScreen checkId={Number(id)} />;
}
