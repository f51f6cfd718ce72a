import { useLocalSearchParams } from 'expo-router';

import { lazyScreen } from '@/components/shell/lazy-screen';

const PredictScreen = lazyScreen('PredictScreen');

export default function PredictBuild() {
  const { id, from } = useLocalSearchParams<{ id: string; from?: string }>();
  return <PredictScreen bowId={Number(id)} startFromBuildId={from ? Number(from) : undefined} />;
}
