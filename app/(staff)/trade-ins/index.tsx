import { TradeInsScreen } from '@/modules/pianos/ui/trade-ins-screen';

export default function TradeInsRoute() {
  return <TradeInsScreen />;
}
