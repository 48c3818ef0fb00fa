import type { ReactNode } from 'react';

import { can, rolesThatCan, ROLE_LABELS, type Ability } from '@/modules/accounts/core/roles';
import { useSession } from '@/modules/accounts/ui/use-session';
import { EmptyState } from '@/modules/theme/ui/empty-state';
import { Screen } from '@/modules/theme/ui/screen';

/** A page for the roles with an ability only: others get a plain word instead of a page of refusals. */
export function AbilityGate({ ability, title, eyebrow = 'Workshop', children }: { ability: Ability; title: string; eyebrow?: string; children: ReactNode }) {
  const { user } = useSession();
  if (user && can(user.role, ability)) return <>{children}</>;
  const roles = rolesThatCan(ability);
  return (
    <Screen title={title} eyebrow={eyebrow}>
      <EmptyState title="Not part of your work">
        This page is for the {roles.map((r) => ROLE_LABELS[r].toLowerCase()).join(' and ')} role{roles.length > 1 ? 's' : ''}.
      </EmptyState>
    </Screen>
  );
}
