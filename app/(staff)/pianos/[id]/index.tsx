import { useLocalSearchParams } from 'expo-router';

import { parseId } from '@/modules/pianos/ui/piano-format';
import { PianoScreen } from '@/modules/pianos/ui/piano-screen';

export default function PianoRoute() {
  const { id } = useLocalSearchParams<{ id: string }>();
  return <PianoScreen key={id} id={parseId(id)} />;
}
