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
  // A play-test recording of a piano, and the pitch and level results measured from it.
  | 'recordTone'
  | 'readToneResults'
  // The local demo inbox of e-mails the server sent (development and tests only).
  | 'readDemoInbox'
  // See the jobs that failed or stalled, and run one again.
  | 'tendBackgroundWork'
  // Correct a time entry one logged oneself, or one anyone logged.
  | 'correctOwnTime'
  | 'correctAnyTime'
  // The dealer's address, contact, locale and time zone on the papers, and the workshop's idle rule.
  | 'editShopProfile'
  // Set a piano's asking price.
  | 'setPrices'
  // See the pianos sitting in the workshop with no work planned.
  | 'seeIdleWorkshop';

const ABILITIES: Record<Role, readonly Ability[]> = {
  intake: ['readPianos', 'createPianos', 'readSellerDetails', 'assess', 'uploadPhotos', 'recordTone', 'readToneResults'],
  technician: ['readPianos', 'uploadPhotos', 'remeasure', 'recordTone', 'readToneResults', 'correctOwnTime'],
  floor: ['readPianos', 'recordTone', 'readToneResults'],
  manager: ['manageUsers', 'readPianos', 'createPianos', 'readSellerDetails', 'assess', 'uploadPhotos', 'setGradeRules', 'remeasure', 'recordTone', 'readToneResults', 'readDemoInbox', 'tendBackgroundWork', 'correctOwnTime', 'correctAnyTime', 'editShopProfile', 'setPrices', 'seeIdleWorkshop'],
};

export function can(role: Role, ability: Ability): boolean {
  return ABILITIES[role].includes(ability);
}

export function isRole(value: unknown): value is Role {
  return typeof value === 'string' && (ROLES as readonly string[]).includes(value);
}
