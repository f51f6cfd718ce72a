import { useLocalSearchParams } from 'expo-router';

import { lazyScreen } from '@/components/shell/lazy-screen';

const BowScreen = lazyScreen('BowScreen');

export default function Bow() {
  const { id } = useLocalSearchParams<{ id: string }>();
  return <BowScreen bowId={Number(id)} />;
}
