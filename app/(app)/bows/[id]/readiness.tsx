import { useLocalSearchParams } from 'expo-router';

import { ReadinessScreen } from '@/components/level/readiness-screen';

export default function BowReadiness() {
  const { id } = useLocalSearchParams<{ id: string }>();
  return <ReadinessScreen bowId={Number(id)} />;
}
