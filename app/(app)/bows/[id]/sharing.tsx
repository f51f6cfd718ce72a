import { useLocalSearchParams } from 'expo-router';

import { lazyScreen } from '@/components/shell/lazy-screen';

const BowSharingScreen = lazyScreen('BowSharingScreen');

export default function BowSharing() {
  const { id } = useLocalSearchParams<{ id: string }>();
  return <BowSharingScreen bowId={Number(id)} />;
}
