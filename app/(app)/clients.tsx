import { lazyScreen } from '@/components/shell/lazy-screen';

const ClientsScreen = lazyScreen('ClientsScreen');

export default function Clients() {
  return <ClientsScreen />;
}
