import { useLocalSearchParams } from 'expo-router';

import { BuildScreen } from '@/components/builds/build-screen';

export default function Build() {
  const { id } = useLocalSearchParams<{ id: string }>();
  return <BuildScreen buildId={Number(id)} />;
}
