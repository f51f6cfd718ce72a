import { NewBowScreen } from '@/components/bows/new-bow-screen';

export default function NewBow() {
  return <NewBowScreen />;
}
