import { useQuery } from 'urql';

import { can, type Role } from '@/modules/accounts/core/roles';

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
  // Those who work at the bench first, then those who also plan the work; by name within each.
  const planner = (m: Assignee) => (can(m.role, 'planWork') ? 1 : 0);
  return team ? team.filter((m) => m.active && can(m.role, 'workAtBench')).sort((a, b) => planner(a) - planner(b) || a.name.localeCompare(b.name)) : null;
}
