import { ClimateScreen } from '@/modules/shop/ui/climate-screen';

export default function WorkshopClimateRoute() {
  return <ClimateScreen />;
}
