import { useLocalSearchParams } from 'expo-router';

import { lazyScreen } from '@/components/shell/lazy-screen';

const LevelScreen = lazyScreen('LevelScreen');

export default function BowLevel() {
  const { id } = useLocalSearchParams<{ id: string }>();
  return <LevelScreen bowId={Number(id)} />;
}
