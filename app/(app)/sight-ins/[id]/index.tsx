import { useLocalSearchParams } from 'expo-router';

import { lazyScreen } from '@/components/shell/lazy-screen';

const SightInScreen = lazyScreen('SightInScreen');

export default function SightIn() {
  const { id } = useLocalSearchParams<{ id: string }>();
  return <SightInScreen sightInId={Number(id)} />;
}
