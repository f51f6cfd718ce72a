import { useLocalSearchParams } from 'expo-router';

import { lazyScreen } from '@/components/shell/lazy-screen';

const EditBowScreen = lazyScreen('EditBowScreen');

export default function EditBow() {
  const { id } = useLocalSearchParams<{ id: string }>();
  return <EditBowScreen bowId={Number(id)} />;
}
