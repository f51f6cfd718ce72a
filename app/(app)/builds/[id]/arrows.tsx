import { useLocalSearchParams } from 'expo-router';

import { ArrowSetsScreen } from '@/components/arrows/arrow-sets-screen';

export default function BuildArrows() {
  const { id } = useLocalSearchParams<{ id: string }>();
  return <ArrowSetsScreen buildId={Number(id)} />;
}
