import { RoleHomeRedirect } from '@/modules/accounts/ui/role-home-redirect';

export default function StaffIndexRoute() {
  return <RoleHomeRedirect />;
}
