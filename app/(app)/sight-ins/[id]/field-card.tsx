import { useLocalSearchParams } from 'expo-router';

import { lazyScreen } from '@/components/shell/lazy-screen';

const FieldCardScreen = lazyScreen('FieldCardScreen');

export default function FieldCard() {
  const { id } = useLocalSearchParams<{ id: string }>();
  return <FieldCardScreen sightInId={Number(id)} />;
}
