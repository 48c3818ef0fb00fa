import { BenchScreen } from '@/modules/pianos/ui/bench-screen';

export default function BenchRoute() {
  return <BenchScreen />;
}
