import { DepositRulesScreen } from '@/modules/deposits/ui/deposit-rules-screen';

export default function DepositRulesRoute() {
  return <DepositRulesScreen />;
}
