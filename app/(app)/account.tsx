import { lazyScreen } from '@/components/shell/lazy-screen';

const AccountScreen = lazyScreen('AccountScreen');

export default function Account() {
  return <AccountScreen />;
}
