import { useLocalSearchParams } from 'expo-router';

import { lazyScreen } from '@/components/shell/lazy-screen';

const BuildScreen = lazyScreen('BuildScreen');

export default function Build() {
  const { id } = useLocalSearchParams<{ id: string }>();
  return <BuildScreen buildId={Number(id)} />;
}
