// The four staff roles and what each may do: the one table of rights. Services and screens ask
// `can(role, ability)`; no other code compares role names.
export const ROLES = ['intake', 'technician', 'floor', 'manager'] as const;
export type Role = (typeof ROLES)[number];

export const ROLE_LABELS: Record<Role, string> = {
  intake: 'Intake',
  technician: 'Technician',
  floor: 'Floor',
  manager: 'Manager',
};

export const ABILITIES = [
  // accounts
  /** Create accounts, change roles, deactivate; read every account's e-mail, role and status. */
  'manageUsers',
  // pianos
  /** The stock records, their stages and history, assessments, photos, disclosures' versions, the shop's rules and texts. */
  'readPianos',
  'createPianos',
  /** The stock overview of every stage. */
  'overseeStock',
  /** Put on the floor, take off it, record the sale and the delivery; a piano's deposits and balance. */
  'sellPianos',
  /** Decide what happens to an assessed piano (recondition, sell as it stands, wholesale, decline), approve its plan, reopen its work. */
  'decidePianos',
  // assessment
  'readSellerDetails',
  /** A buyer's name and contact details recorded at the sale: personal data, read like a seller's. */
  'readBuyerDetails',
  /** Take a piano in: its intake, its inspection and corrections of it. */
  'assess',
  'setGradeRules',
  /** Measure again after workshop work. */
  'remeasure',
  // photos
  'uploadPhotos',
  // shop (the workshop)
  /** What work costs: the rate card and the plans' estimates (the trade-in offer rests on them). */
  'readWorkCosts',
  /** The bench: the work queue, items, timers, time, parts, notes, the workshop's climate, finishing the work. A role with it can be given work. */
  'workAtBench',
  /** Log work on an item someone else has taken. */
  'workOnAnyItem',
  /** Plan the work: add, change and drop items, assign them, the whole bench, the overruns. */
  'planWork',
  /** See the pianos sitting in the workshop with no work planned. */
  'seeIdleWorkshop',
  'setRates',
  /** Correct a time entry one logged oneself, or one anyone logged. */
  'correctOwnTime',
  'correctAnyTime',
  // disclosure
  /** Publish a disclosure, hand it to a buyer, countersign acknowledgements, print floor tags and signed copies. */
  'showToBuyers',
  'editShopTexts',
  /** The dealer's address, contact, locale and time zone on the papers, and the workshop's idle rule. */
  'editShopProfile',
  // pricing
  /** A trade-in offer with its lines, and the seller's answer to it (accepted, a counter-offer, agreed, declined). */
  'readOffers',
  'answerOffers',
  /** Money the dealer keeps to itself: trade-in allowances, cost basis, margins, the stock table and its charts. */
  'readCostsAndMargins',
  /** Set a piano's asking price (every change kept with who, when and why), and read its price history. */
  'setPrices',
  'setPricingRules',
  // deposits
  /** Hold and release pianos by hand, refund deposits, set the deposit rules. */
  'manageDeposits',
  // tone
  /** A play-test recording of a piano, and the pitch and level results measured from it. */
  'recordTone',
  'readToneResults',
  // jobs
  /** See the jobs that failed or stalled, and run one again. */
  'tendBackgroundWork',
  /** The local demo inbox of e-mails the server sent (development and tests only). */
  'readDemoInbox',
] as const;
export type Ability = (typeof ABILITIES)[number];

const RIGHTS: Record<Role, readonly Ability[]> = {
  intake: ['readPianos', 'createPianos', 'readSellerDetails', 'readBuyerDetails', 'assess', 'uploadPhotos', 'readWorkCosts', 'recordTone', 'readToneResults', 'readOffers', 'answerOffers'],
  technician: ['readPianos', 'uploadPhotos', 'remeasure', 'readWorkCosts', 'workAtBench', 'correctOwnTime', 'recordTone', 'readToneResults'],
  floor: ['readPianos', 'sellPianos', 'showToBuyers', 'recordTone', 'readToneResults'],
  manager: ABILITIES,
};

export function can(role: Role, ability: Ability): boolean {
  return RIGHTS[role].includes(ability);
}

/** The roles that have an ability: who gets an e-mail about it, who can be given the work. */
export function rolesThatCan(ability: Ability): Role[] {
  return ROLES.filter((r) => can(r, ability));
}

export function isRole(value: unknown): value is Role {
  return typeof value === 'string' && (ROLES as readonly string[]).includes(value);
}
