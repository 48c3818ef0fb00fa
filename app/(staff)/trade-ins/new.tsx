import { IntakeScreen } from '@/modules/assessment/ui/intake-screen';

export default function NewTradeInRoute() {
  return <IntakeScreen />;
}
