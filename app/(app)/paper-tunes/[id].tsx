import { useLocalSearchParams } from 'expo-router';

import { lazyScreen } from '@/components/shell/lazy-screen';

const PaperTuneScreen = lazyScreen('PaperTuneScreen');

export default function PaperTune() {
  const { id } = useLocalSearchParams<{ id: string }>();
  return <PaperTuneScreen runId={Number(id)} />;
}
