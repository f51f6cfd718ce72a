import { useLocalSearchParams } from 'expo-router';

import { BowScreen } from '@/components/bows/bow-screen';

export default function Bow() {
  const { id } = useLocalSearchParams<{ id: string }>();
  return <BowScreen bowId={Number(id)} />;
}
