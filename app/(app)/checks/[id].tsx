import { useLocalSearchParams } from 'expo-router';

import { lazyScreen } from '@/components/shell/lazy-screen';

const CheckScreen = lazyScreen('CheckScreen');

export default function LevelCheck() {
  const { id } = useLocalSearchParams<{ id: string }>();
  return <CheckScreen checkId={Number(id)} />;
}
