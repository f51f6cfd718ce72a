import { useLocalSearchParams } from 'expo-router';

import { FieldCardScreen } from '@/components/field-card/field-card-screen';

export default function FieldCard() {
  const { id } = useLocalSearchParams<{ id: string }>();
  return <FieldCardScreen sessionId={Number(id)} />;
}
