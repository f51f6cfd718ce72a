import { useLocalSearchParams } from 'expo-router';

import { lazyScreen } from '@/components/shell/lazy-screen';

const TapeScreen = lazyScreen('TapeScreen');

export default function Tape() {
  const { id, tape } = useLocalSearchParams<{ id: string; tape?: string }>();
  return <TapeScreen sightInId={Number(id)} tapeId={tape ? Number(tape) : undefined} />;
}
