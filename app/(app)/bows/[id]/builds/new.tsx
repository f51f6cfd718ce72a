import { useLocalSearchParams } from 'expo-router';

import { lazyScreen } from '@/components/shell/lazy-screen';

const NewBuildScreen = lazyScreen('NewBuildScreen');

export default function NewBuild() {
  const { id } = useLocalSearchParams<{ id: string }>();
  return <NewBuildScreen bowId={Number(id)} />;
}
