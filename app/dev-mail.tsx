import { lazyScreen } from '@/components/shell/lazy-screen';

const DevMailScreen = lazyScreen('DevMailScreen');

export default function DevMail() {
  return <DevMailScreen />;
}
