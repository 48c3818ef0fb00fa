import { Redirect } from 'expo-router';

import { ROLE_HOME } from './staff-nav';
import { useSession } from './use-session';

/** "/" sends each role to its own home, and a visitor to sign-in. */
export function RoleHomeRedirect() {
  const { user } = useSession();
  return <Redirect href={user ? ROLE_HOME[user.role] : '/sign-in'} />;
}
