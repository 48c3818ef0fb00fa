import { useLocalSearchParams } from 'expo-router';

import { parseId } from '@/modules/pianos/ui/piano-format';
import { PianoWorkshopScreen } from '@/modules/shop/ui/piano-workshop-screen';

export default function PianoWorkshopRoute() {
  const { id } = useLocalSearchParams<{ id: string }>();
  return <PianoWorkshopScreen key={id} id={parseId(id)} />;
}
