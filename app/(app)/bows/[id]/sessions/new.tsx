import { useLocalSearchParams } from 'expo-router';

import { NewSessionScreen } from '@/components/sessions/new-session-screen';

export default function NewSession() {
  const { id, build } = useLocalSearchParams<{ id: string; build?: string }>();
  return <NewSessionScreen bowId={Number(id)} buildId={build ? Number(build) : undefined} />;
}
