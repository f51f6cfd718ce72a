import { useLocalSearchParams } from 'expo-router';

import { TuningScreen } from '@/components/tuning/tuning-screen';

export default function BowTuning() {
  const { id } = useLocalSearchParams<{ id: string }>();
  return <TuningScreen bowId={Number(id)} />;
}
