import { useLocalSearchParams } from 'expo-router';

import { LevelScreen } from '@/components/level/level-screen';

export default function BowLevel() {
  const { id } = useLocalSearchParams<{ id: string }>();
  return <LevelScreen bowId={Number(id)} />;
}
