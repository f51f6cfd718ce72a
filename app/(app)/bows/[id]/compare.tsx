import { useLocalSearchParams } from 'expo-router';

import { CompareScreen } from '@/components/compare/compare-screen';

export default function CompareBuilds() {
  const { id, builds } = useLocalSearchParams<{ id: string; builds?: string }>();
  return <CompareScreen bowId={Number(id)} initialBuilds={builds ? builds.split(',').map(Number) : []} />;
}
