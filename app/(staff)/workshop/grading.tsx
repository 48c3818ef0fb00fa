import { GradeRulesScreen } from '@/modules/assessment/ui/grade-rules-screen';

export default function WorkshopGradingRoute() {
  return <GradeRulesScreen />;
}
