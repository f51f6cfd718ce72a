import { HomeScreen } from '@/components/home/home-screen';

export default function Home() {
  return <HomeScreen />;
}
