import { useLocalSearchParams } from 'expo-router';

import { parseId } from '@/modules/pianos/ui/piano-format';
import { WorkItemScreen } from '@/modules/shop/ui/work-item-screen';

export default function WorkItemRoute() {
  const { id } = useLocalSearchParams<{ id: string }>();
  return <WorkItemScreen key={id} id={parseId(id)} />;
}
