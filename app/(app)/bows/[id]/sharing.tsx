import { useLocalSearchParams } from 'expo-router';

import { BowSharingScreen } from '@/components/shares/bow-sharing-screen';

export default function BowSharing() {
  const { id } = useLocalSearchParams<{ id: string }>();
  return <BowSharingScreen bowId={Number(id)} />;
}
