import { TryScreen } from '@/components/try/try-screen';

export default function Try() {
  return <TryScreen />;
}
