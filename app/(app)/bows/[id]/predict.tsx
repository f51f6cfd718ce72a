import { useLocalSearchParams } from 'expo-router';

import { PredictScreen } from '@/components/predict/predict-screen';

export default function PredictBuild() {
  const { id, from } = useLocalSearchParams<{ id: string; from?: string }>();
  return <PredictScreen bowId={Number(id)} startFromBuildId={from ? Number(from) : undefined} />;
}
