import { RateCardScreen } from '@/modules/shop/ui/rate-card-screen';

export default function WorkshopRatesRoute() {
  return <RateCardScreen />;
}
