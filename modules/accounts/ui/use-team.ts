import { useMutation, useQuery } from 'urql';

import type { Role } from '@/modules/accounts/core/roles';

export interface TeamMember {
  id: number;
  email: string;
  name: string;
  role: Role;
  active: boolean;
  createdAt: string;
}

const MEMBER_FIELDS = 'id email name role active createdAt';

export const TEAM_QUERY = `query Team { team { ${MEMBER_FIELDS} } }`;

// A constant: urql compares context by identity, and a fresh object each render would ask again each render.
const TEAM_CONTEXT = { additionalTypenames: ['Users'] };

export function useTeam() {
  const [result] = useQuery<{ team: TeamMember[] }>({ query: TEAM_QUERY, context: TEAM_CONTEXT, requestPolicy: 'cache-and-network' });
  return { team: result.data?.team ?? null, fetching: result.fetching, error: result.error };
}

export const CREATE_USER = `mutation CreateUser($email: String!, $name: String!, $role: String!, $password: String!) {
  createUser(email: $email, name: $name, role: $role, password: $password) { ${MEMBER_FIELDS} }
}`;

export const CHANGE_ROLE = `mutation ChangeUserRole($userId: Int!, $role: String!) {
  changeUserRole(userId: $userId, role: $role) { ${MEMBER_FIELDS} }
}`;

export const SET_ACTIVE = `mutation SetUserActive($userId: Int!, $active: Boolean!) {
  setUserActive(userId: $userId, active: $active) { ${MEMBER_FIELDS} }
}`;

export function useCreateUser() {
  const [state, run] = useMutation<{ createUser: TeamMember }, { email: string; name: string; role: Role; password: string }>(CREATE_USER);
  return { creating: state.fetching, createUser: run };
}

export function useChangeRole() {
  const [state, run] = useMutation<{ changeUserRole: TeamMember }, { userId: number; role: Role }>(CHANGE_ROLE);
  return { changing: state.fetching, changeRole: run };
}

export function useSetActive() {
  const [state, run] = useMutation<{ setUserActive: TeamMember }, { userId: number; active: boolean }>(SET_ACTIVE);
  return { saving: state.fetching, setActive: run };
}
