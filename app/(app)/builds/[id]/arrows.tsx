import { useLocalSearchParams } from 'expo-router';

import { lazyScreen } from '@/components/shell/lazy-screen';

const ArrowSetsScreen = lazyScreen('ArrowSetsScreen');

export default function BuildArrows() {
  const { id } = useLocalSearchParams<{ id: string }>();
  return <ArrowSetsScreen buildId={Number(id)} />;
}
