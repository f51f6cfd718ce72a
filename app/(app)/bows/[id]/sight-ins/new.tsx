import { useLocalSearchParams } from 'expo-router';

import { lazyScreen } from '@/components/shell/lazy-screen';

const NewSightInScreen = lazyScreen('NewSightInScreen');

export default function NewSightIn() {
  const { id, build } = useLocalSearchParams<{ id: string; build?: string }>();
  return <NewSightInScreen bowId={Number(id)} buildId={build ? Number(build) : undefined} />;
}
