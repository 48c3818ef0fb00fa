import { useMutation, useQuery } from 'urql';

import type {
  ChangeUserRoleMutation,
  ChangeUserRoleMutationVariables,
  CreateUserMutation,
  CreateUserMutationVariables,
  SetUserActiveMutation,
  SetUserActiveMutationVariables,
  TeamMemberFragment,
  TeamQuery,
} from '@/modules/api/ui/graphql-types';

import { withFragments } from '@/modules/api/ui/document';

export type TeamMember = TeamMemberFragment;

const MEMBER = /* GraphQL */ `
  fragment TeamMember on Users { id email name role active createdAt }
`;

export const TEAM_QUERY = withFragments(/* GraphQL */ `query Team { team { ...TeamMember } }`, MEMBER);

// A constant: urql compares context by identity, and a fresh object each render would ask again each render.
const TEAM_CONTEXT = { additionalTypenames: ['Users'] };

export function useTeam() {
  const [result] = useQuery<TeamQuery>({ query: TEAM_QUERY, context: TEAM_CONTEXT, requestPolicy: 'cache-and-network' });
  return { team: result.data?.team ?? null, fetching: result.fetching, error: result.error };
}

export const CREATE_USER = withFragments(
  /* GraphQL */ `mutation CreateUser($email: String!, $name: String!, $role: String!, $password: String!) {
  createUser(email: $email, name: $name, role: $role, password: $password) { ...TeamMember }
}`,
  MEMBER,
);

export const CHANGE_ROLE = withFragments(
  /* GraphQL */ `mutation ChangeUserRole($userId: Int!, $role: String!) {
  changeUserRole(userId: $userId, role: $role) { ...TeamMember }
}`,
  MEMBER,
);

export const SET_ACTIVE = withFragments(
  /* GraphQL */ `mutation SetUserActive($userId: Int!, $active: Boolean!) {
  setUserActive(userId: $userId, active: $active) { ...TeamMember }
}`,
  MEMBER,
);

export function useCreateUser() {
  const [state, run] = useMutation<CreateUserMutation, CreateUserMutationVariables>(CREATE_USER);
  return { creating: state.fetching, createUser: run };
}

export function useChangeRole() {
  const [state, run] = useMutation<ChangeUserRoleMutation, ChangeUserRoleMutationVariables>(CHANGE_ROLE);
  return { changing: state.fetching, changeRole: run };
}

export function useSetActive() {
  const [state, run] = useMutation<SetUserActiveMutation, SetUserActiveMutationVariables>(SET_ACTIVE);
  return { saving: state.fetching, setActive: run };
}
