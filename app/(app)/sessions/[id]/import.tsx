import { useLocalSearchParams } from 'expo-router';

import { MarksImportScreen } from '@/components/import-export/marks-import-screen';

export default function ImportMarks() {
  const { id } = useLocalSearchParams<{ id: string }>();
  return <MarksImportScreen sessionId={Number(id)} />;
}
