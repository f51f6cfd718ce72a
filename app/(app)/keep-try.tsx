import { lazyScreen } from '@/components/shell/lazy-screen';

// Loads with the workshop screens (components/shell/workshop-screens.ts), not in the first download.
const KeepTryScreen = lazyScreen('KeepTryScreen');

export default function KeepTry() {
  return <KeepTryScreen />;
}
