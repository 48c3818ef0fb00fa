import { useQuery } from 'urql';

import type { Role } from '@/modules/accounts/core/roles';

export interface Assignee {
  id: number;
  name: string;
  role: Role;
}

export const ASSIGNEES_QUERY = 'query Assignees { team { id name role active } }';

/** Who work can go to: active technicians and managers (the team list is for managers only). */
export function useAssignees(pause: boolean) {
  const [result] = useQuery<{ team: (Assignee & { active: boolean })[] }>({ query: ASSIGNEES_QUERY, pause, requestPolicy: 'cache-and-network' });
  const team = result.data?.team ?? null;
  return team ? team.filter((m) => m.active && (m.role === 'technician' || m.role === 'manager')).sort((a, b) => (a.role === b.role ? a.name.localeCompare(b.name) : a.role === 'technician' ? -1 : 1)) : null;
}
