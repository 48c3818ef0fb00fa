import { StockScreen } from '@/modules/pianos/ui/stock-screen';

export default function StockRoute() {
  return <StockScreen />;
}
