import { StockTableScreen } from '@/modules/pricing/ui/stock-table-screen';

export default function StockTableRoute() {
  return <StockTableScreen />;
}
