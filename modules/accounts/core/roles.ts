// The four staff roles and what each may do; client and server read the same table.
export const ROLES = ['intake', 'technician', 'floor', 'manager'] as const;
export type Role = (typeof ROLES)[number];

export const ROLE_LABELS: Record<Role, string> = {
  intake: 'Intake',
  technician: 'Technician',
  floor: 'Floor',
  manager: 'Manager',
};

export type Ability =
  | 'manageUsers'
  | 'readPianos'
  | 'createPianos'
  | 'readSellerDetails'
  | 'assess'
  | 'uploadPhotos'
  | 'setGradeRules'
  | 'remeasure'
  /** correct a time entry one logged oneself */
  | 'correctOwnTime'
  /** correct a time entry anyone logged */
  | 'correctAnyTime';

const ABILITIES: Record<Role, readonly Ability[]> = {
  intake: ['readPianos', 'createPianos', 'readSellerDetails', 'assess', 'uploadPhotos'],
  technician: ['readPianos', 'uploadPhotos', 'remeasure', 'correctOwnTime'],
  floor: ['readPianos'],
  manager: ['manageUsers', 'readPianos', 'createPianos', 'readSellerDetails', 'assess', 'uploadPhotos', 'setGradeRules', 'remeasure', 'correctOwnTime', 'correctAnyTime'],
};

export function can(role: Role, ability: Ability): boolean {
  return ABILITIES[role].includes(ability);
}

export function isRole(value: unknown): value is Role {
  return typeof value === 'string' && (ROLES as readonly string[]).includes(value);
}
