import { useLocalSearchParams } from 'expo-router';

import { PresentScreen } from '@/modules/disclosure/ui/present-screen';
import { parseId } from '@/modules/pianos/ui/piano-format';

export default function PresentRoute() {
  const { id } = useLocalSearchParams<{ id: string }>();
  return <PresentScreen key={id} id={parseId(id)} />;
}
