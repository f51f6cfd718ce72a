import { lazyScreen } from '@/components/shell/lazy-screen';

const TryScreen = lazyScreen('TryScreen');

export default function Try() {
  return <TryScreen />;
}
