import { DevMailScreen } from '@/components/dev-mail/dev-mail-screen';

export default function DevMail() {
  return <DevMailScreen />;
}
