import { NotFoundScreen } from '@/components/ui/not-found-screen';

export default function NotFound() {
  return <NotFoundScreen />;
}
