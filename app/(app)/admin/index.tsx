import { AccountsScreen } from '@/components/admin/accounts-screen';

export default function AdminAccounts() {
  return <AccountsScreen />;
}
