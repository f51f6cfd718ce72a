import { useLocalSearchParams } from 'expo-router';

import { lazyScreen } from '@/components/shell/lazy-screen';

const NewSessionScreen = lazyScreen('NewSessionScreen');

export default function NewSession() {
  const { id, build } = useLocalSearchParams<{ id: string; build?: string }>();
  return <NewSessionScreen bowId={Number(id)} buildId={build ? Number(build) : undefined} />;
}
