import { StockChartsScreen } from '@/modules/pricing/ui/stock-charts-screen';

export default function StockChartsRoute() {
  return <StockChartsScreen />;
}
