import { useLocalSearchParams } from 'expo-router';

import { lazyScreen } from '@/components/shell/lazy-screen';

const CompareScreen = lazyScreen('CompareScreen');

export default function CompareBuilds() {
  const { id, builds } = useLocalSearchParams<{ id: string; builds?: string }>();
  return <CompareScreen bowId={Number(id)} initialBuilds={builds ? builds.split(',').map(Number) : []} />;
}
