import { useLocalSearchParams } from 'expo-router';

import { lazyScreen } from '@/components/shell/lazy-screen';

const ReadinessScreen = lazyScreen('ReadinessScreen');

export default function BowReadiness() {
  const { id } = useLocalSearchParams<{ id: string }>();
  return <ReadinessScreen bowId={Number(id)} />;
}
