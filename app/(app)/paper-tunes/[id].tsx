import { useLocalSearchParams } from 'expo-router';

import { PaperTuneScreen } from '@/components/tuning/paper-tune-screen';

export default function PaperTune() {
  const { id } = useLocalSearchParams<{ id: string }>();
  return <PaperTuneScreen runId={Number(id)} />;
}
