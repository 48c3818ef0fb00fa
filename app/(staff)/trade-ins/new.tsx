import { TradeInFormScreen } from '@/modules/pianos/ui/trade-in-form-screen';

export default function NewTradeInRoute() {
  return <TradeInFormScreen />;
}
