import { useLocalSearchParams } from 'expo-router';

import { DepositConfirmationScreen } from '@/modules/deposits/ui/deposit-confirmation-screen';
import { parseSession } from '@/modules/disclosure/ui/route-params';

export default function DepositConfirmationRoute() {
  const { token, session } = useLocalSearchParams<{ token: string; session?: string }>();
  return <DepositConfirmationScreen token={typeof token === 'string' ? token : null} sessionId={parseSession(session)} />;
}
