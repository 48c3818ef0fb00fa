import { ShowroomScreen } from '@/modules/pianos/ui/showroom-screen';

export default function ShowroomRoute() {
  return <ShowroomScreen />;
}
