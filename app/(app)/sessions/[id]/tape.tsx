import { useLocalSearchParams } from 'expo-router';

import { TapeScreen } from '@/components/tapes/tape-screen';

export default function Tape() {
  const { id, tape } = useLocalSearchParams<{ id: string; tape?: string }>();
  return <TapeScreen sessionId={Number(id)} tapeId={tape ? Number(tape) : undefined} />;
}
