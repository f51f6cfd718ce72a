import { useLocalSearchParams } from 'expo-router';

import { EditBowScreen } from '@/components/bows/edit-bow-screen';

export default function EditBow() {
  const { id } = useLocalSearchParams<{ id: string }>();
  return <EditBowScreen bowId={Number(id)} />;
}
