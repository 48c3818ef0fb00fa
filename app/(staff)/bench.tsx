import { BenchScreen } from '@/modules/shop/ui/bench-screen';

export default function BenchRoute() {
  return <BenchScreen />;
}
