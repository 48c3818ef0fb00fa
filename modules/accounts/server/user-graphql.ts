import { GraphQLBoolean, GraphQLInt, GraphQLList, GraphQLNonNull, GraphQLString } from 'graphql';

import { can } from '@/modules/accounts/core/roles';
import type { GraphDomain } from '@/server/graphql/domain';

import { StaffMember } from './staff-member-model';
import { User } from './user-model';
import { changeRole, createUser, listUsers, setActive } from './user-service';

export const accountsGraph: GraphDomain = {
  readModels: [
    // Who logged a piano, who assessed it: a name, through those relations only.
    { model: StaffMember },
    {
      model: User,
      fieldName: 'user',
      listFieldName: 'users',
      filters: { single: ['idEq'], list: ['limit', 'offset'] },
      // A manager reads every account; anyone else reads only their own.
      readPolicy: (builder, ctx) => {
        if (!can(ctx.user.role, 'manageUsers')) builder.where('users.id', ctx.user.id);
      },
    },
  ],
  queries: (typeOf) => ({
    me: {
      type: new GraphQLNonNull(typeOf(User)),
      resolve: (_root, _args, ctx) => ctx.user.$toJson(),
    },
    team: {
      type: new GraphQLNonNull(new GraphQLList(new GraphQLNonNull(typeOf(User)))),
      description: 'Every account, active or not (managers only).',
      resolve: async (_root, _args, ctx) => (await listUsers(ctx.user)).map((u) => u.$toJson()),
    },
  }),
  mutations: (typeOf) => ({
    createUser: {
      type: new GraphQLNonNull(typeOf(User)),
      args: {
        email: { type: new GraphQLNonNull(GraphQLString) },
        name: { type: new GraphQLNonNull(GraphQLString) },
        role: { type: new GraphQLNonNull(GraphQLString) },
        password: { type: new GraphQLNonNull(GraphQLString) },
      },
      resolve: async (_root, args, ctx) => (await createUser(ctx.user, args)).$toJson(),
    },
    changeUserRole: {
      type: new GraphQLNonNull(typeOf(User)),
      args: { userId: { type: new GraphQLNonNull(GraphQLInt) }, role: { type: new GraphQLNonNull(GraphQLString) } },
      resolve: async (_root, args, ctx) => (await changeRole(ctx.user, args)).$toJson(),
    },
    setUserActive: {
      type: new GraphQLNonNull(typeOf(User)),
      args: { userId: { type: new GraphQLNonNull(GraphQLInt) }, active: { type: new GraphQLNonNull(GraphQLBoolean) } },
      resolve: async (_root, args: { userId: number; active: boolean }, ctx) =>
        (await setActive(ctx.user, args.userId, args.active)).$toJson(),
    },
  }),
};
