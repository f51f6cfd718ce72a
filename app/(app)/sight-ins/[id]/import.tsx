import { useLocalSearchParams } from 'expo-router';

import { lazyScreen } from '@/components/shell/lazy-screen';

const MarksImportScreen = lazyScreen('MarksImportScreen');

export default function ImportMarks() {
  const { id } = useLocalSearchParams<{ id: string }>();
  return <MarksImportScreen sightInId={Number(id)} />;
}
