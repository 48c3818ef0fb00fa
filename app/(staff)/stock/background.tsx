import { BackgroundWorkScreen } from '@/modules/jobs/ui/background-work-screen';

export default function BackgroundWorkRoute() {
  return <BackgroundWorkScreen />;
}
