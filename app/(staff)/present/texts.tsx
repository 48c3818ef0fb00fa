import { ShopTextsScreen } from '@/modules/disclosure/ui/shop-texts-screen';

export default function PresentTextsRoute() {
  return <ShopTextsScreen />;
}
