import { useLocalSearchParams } from 'expo-router';

import { CorrectionScreen } from '@/modules/assessment/ui/correction-screen';
import { parseId } from '@/modules/pianos/ui/piano-format';

export default function CorrectAssessmentRoute() {
  const { id } = useLocalSearchParams<{ id: string }>();
  return <CorrectionScreen key={id} pianoId={parseId(id)} />;
}
