import { ClientList } from '@/components/clients/client-list';
import { Screen } from '@/components/ui/screen';
import { ScreenTitle } from '@/components/ui/screen-title';
import { SectionHeading } from '@/components/ui/section-heading';

/**
 * A technician's clients: each archer who shares bows with them, with those
 * bows. A share the archer ends disappears from here at once.
 */
export function ClientsScreen() {
  return (
    <Screen testID="clients-screen">
      <ScreenTitle name="Clients" />
      <SectionHeading
        level={1}
        title="Clients"
        description="Archers who share a bow with you. Open a bow to see its records and add to them."
      />
      <ClientList />
    </Screen>
  );
}
