import { ClientsScreen } from '@/components/clients/clients-screen';

export default function Clients() {
  return <ClientsScreen />;
}
