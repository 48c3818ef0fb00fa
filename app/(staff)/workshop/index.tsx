import { WorkshopScreen } from '@/modules/shop/ui/workshop-screen';

export default function WorkshopIndexRoute() {
  return <WorkshopScreen />;
}
