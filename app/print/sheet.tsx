import { useLocalSearchParams } from 'expo-router';

import { lazyScreen } from '@/components/shell/lazy-screen';

const PrintSheetScreen = lazyScreen('PrintSheetScreen');

export default function PrintSheet() {
  const { sightIn, source, ...layout } = useLocalSearchParams<Record<string, string>>();
  const query = new URLSearchParams(layout).toString();
  return <PrintSheetScreen sightInId={sightIn ? Number(sightIn) : undefined} source={source === 'try' ? 'try' : undefined} query={query} />;
}
