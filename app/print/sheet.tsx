import { useLocalSearchParams } from 'expo-router';

import { lazyScreen } from '@/components/shell/lazy-screen';

const PrintSheetScreen = lazyScreen('PrintSheetScreen');

export default function PrintSheet() {
  // The tape editor links here with ?sight-in=<id> (components/tapes/tape-editor.tsx).
  const { 'sight-in': sightIn, source, ...layout } = useLocalSearchParams<Record<string, string>>();
  const query = new URLSearchParams(layout).toString();
  return <PrintSheetScreen sightInId={sightIn ? Number(sightIn) : undefined} source={source === 'try' ? 'try' : undefined} query={query} />;
}
