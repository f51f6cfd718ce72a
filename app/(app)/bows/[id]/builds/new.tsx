import { useLocalSearchParams } from 'expo-router';

import { NewBuildScreen } from '@/components/builds/new-build-screen';

export default function NewBuild() {
  const { id } = useLocalSearchParams<{ id: string }>();
  return <NewBuildScreen bowId={Number(id)} />;
}
