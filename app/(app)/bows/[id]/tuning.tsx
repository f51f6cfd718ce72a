import { useLocalSearchParams } from 'expo-router';

import { lazyScreen } from '@/components/shell/lazy-screen';

const TuningScreen = lazyScreen('TuningScreen');

export default function BowTuning() {
  const { id } = useLocalSearchParams<{ id: string }>();
  return <TuningScreen bowId={Number(id)} />;
}
