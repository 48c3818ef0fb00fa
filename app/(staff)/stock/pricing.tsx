import { PricingRulesScreen } from '@/modules/pricing/ui/pricing-rules-screen';

export default function PricingRulesRoute() {
  return <PricingRulesScreen />;
}
