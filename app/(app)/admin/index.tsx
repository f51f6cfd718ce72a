import { lazyScreen } from '@/components/shell/lazy-screen';

const AccountsScreen = lazyScreen('AccountsScreen');

export default function AdminAccounts() {
  return <AccountsScreen />;
}
