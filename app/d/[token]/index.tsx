import { useLocalSearchParams } from 'expo-router';

import { DisclosureScreen } from '@/modules/disclosure/ui/disclosure-screen';
import { parseVersion } from '@/modules/disclosure/ui/route-params';

export default function DisclosureRoute() {
  const { token, version } = useLocalSearchParams<{ token: string; version?: string }>();
  return <DisclosureScreen token={typeof token === 'string' ? token : null} version={parseVersion(version)} />;
}
