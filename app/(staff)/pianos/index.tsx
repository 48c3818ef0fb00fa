import { useLocalSearchParams } from 'expo-router';

import { parseStage } from '@/modules/pianos/ui/piano-format';
import { PianoListScreen } from '@/modules/pianos/ui/piano-list-screen';

export default function PianosRoute() {
  const { stage } = useLocalSearchParams<{ stage?: string }>();
  return <PianoListScreen stage={parseStage(stage)} />;
}
