import { NotFoundScreen } from '@/modules/accounts/ui/not-found-screen';

export default function NotFoundRoute() {
  return <NotFoundScreen />;
}
