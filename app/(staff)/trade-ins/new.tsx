import { useLocalSearchParams } from 'expo-router';

import { IntakeScreen } from '@/modules/assessment/ui/intake-screen';
import { parseId } from '@/modules/pianos/ui/piano-format';

export default function NewTradeInRoute() {
  // ?pianoId=12: the intake of a piano logged before its inspection.
  const { pianoId } = useLocalSearchParams<{ pianoId?: string }>();
  return <IntakeScreen pianoId={pianoId === undefined ? null : parseId(pianoId)} />;
}
