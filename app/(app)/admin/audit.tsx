import { AdminAuditScreen } from '@/components/admin/audit-screen';

export default function AdminAudit() {
  return <AdminAuditScreen />;
}
