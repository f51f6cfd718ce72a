import { useLocalSearchParams } from 'expo-router';

import { lazyScreen } from '@/components/shell/lazy-screen';

const PrintSheetScreen = lazyScreen('PrintSheetScreen');

export default function PrintSheet() {
  const { session, source, ...layout } = useLocalSearchParams<Record<string, string>>();
  const query = new URLSearchParams(layout).toString();
  return <PrintSheetScreen sessionId={session ? Number(session) : undefined} source={source === 'try' ? 'try' : undefined} query={query} />;
}
