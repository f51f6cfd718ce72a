import { lazyScreen } from '@/components/shell/lazy-screen';

const NewBowScreen = lazyScreen('NewBowScreen');

export default function NewBow() {
  return <NewBowScreen />;
}
