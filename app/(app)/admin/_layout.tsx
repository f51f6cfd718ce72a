import { Stack } from 'expo-router';

import { AdminGate } from '@/components/admin/admin-gate';

// Administrators only; the gate shows anyone else the not-found page.
export default function AdminLayout() {
  return (
    <AdminGate>
      <Stack screenOptions={{ headerShown: false }} />
    </AdminGate>
  );
}
