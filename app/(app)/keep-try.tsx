import { KeepTryScreen } from '@/components/try/keep-try-screen';

export default function KeepTry() {
  return <KeepTryScreen />;
}
