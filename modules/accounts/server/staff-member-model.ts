import { BaseModel } from '@/server/db/base-model';

/** A colleague by name: the view `staff_members` over the accounts, for "who did it" on any record. */
export class StaffMember extends BaseModel {
  static tableName = 'staff_members';
  id!: number;
  name!: string;

  static jsonSchema = {
    type: 'object',
    properties: {
      id: { type: 'integer' },
      name: { type: 'string' },
    },
  };
}
