import type { ReactNode } from 'react';

import type { Role } from '@/modules/accounts/core/roles';
import { ROLE_LABELS } from '@/modules/accounts/core/roles';
import { useSession } from '@/modules/accounts/ui/use-session';
import { EmptyState } from '@/modules/theme/ui/empty-state';
import { Screen } from '@/modules/theme/ui/screen';

/** A workshop page for some roles only: others get a plain word instead of a page of refusals. */
export function RoleGate({ roles, title, children }: { roles: readonly Role[]; title: string; children: ReactNode }) {
  const { user } = useSession();
  if (user && roles.includes(user.role)) return <>{children}</>;
  return (
    <Screen title={title} eyebrow="Workshop">
      <EmptyState title="Not part of your work">
        This page is for the {roles.map((r) => ROLE_LABELS[r].toLowerCase()).join(' and ')} role{roles.length > 1 ? 's' : ''}.
      </EmptyState>
    </Screen>
  );
}
