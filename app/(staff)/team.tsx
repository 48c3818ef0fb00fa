import { TeamScreen } from '@/modules/accounts/ui/team-screen';

export default function TeamRoute() {
  return <TeamScreen />;
}
