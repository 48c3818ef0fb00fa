import { SignInScreen } from '@/modules/accounts/ui/sign-in-screen';

export default function SignInRoute() {
  return <SignInScreen />;
}
