import { useLocalSearchParams } from 'expo-router';

import { parseId } from '@/modules/pianos/ui/piano-format';
import { PianoScreen } from '@/modules/pianos/ui/piano-screen';

export default function PianoRoute() {
  const { id, created } = useLocalSearchParams<{ id: string; created?: string }>();
  return <PianoScreen key={id} id={parseId(id)} created={created === '1'} />;
}
