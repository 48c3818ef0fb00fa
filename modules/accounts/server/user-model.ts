import type { Pojo } from 'objection';

import { ROLES, type Role } from '@/modules/accounts/core/roles';
import { BaseModel } from '@/server/db/base-model';

export class User extends BaseModel {
  static tableName = 'users';

  id!: number;
  email!: string;
  name!: string;
  role!: Role;
  passwordHash!: string;
  active!: boolean;
  createdAt!: string;

  // passwordHash is left out on purpose: the GraphQL types are generated from this schema.
  static jsonSchema = {
    type: 'object',
    required: ['email', 'name', 'role'],
    properties: {
      id: { type: 'integer' },
      email: { type: 'string', minLength: 3, maxLength: 254 },
      name: { type: 'string', minLength: 1, maxLength: 120 },
      role: { type: 'string', enum: [...ROLES] },
      active: { type: 'boolean' },
      createdAt: { type: 'string' },
      updatedAt: { type: 'string' },
    },
  };

  $formatJson(json: Pojo): Pojo {
    const out = super.$formatJson(json);
    delete out.passwordHash;
    return out;
  }
}

export type PublicUser = Pick<User, 'id' | 'email' | 'name' | 'role'>;

export function publicUser(user: User): PublicUser {
  return { id: user.id, email: user.email, name: user.name, role: user.role };
}
