import { OverrunsScreen } from '@/modules/shop/ui/overruns-screen';

export default function WorkshopOverrunsRoute() {
  return <OverrunsScreen />;
}
