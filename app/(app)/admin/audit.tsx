import { lazyScreen } from '@/components/shell/lazy-screen';

const AdminAuditScreen = lazyScreen('AdminAuditScreen');

export default function AdminAudit() {
  return <AdminAuditScreen />;
}
