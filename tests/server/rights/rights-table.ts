// Who may do what: every GraphQL query and mutation, every relation of a generated read type and every
// REST route, for each staff role and an anonymous caller. tests/server/rights.test.ts asks each one as
// each caller and fails on any answer this table does not expect, and on anything it has no row for.
// A new operation, relation or route gets a row here (the test's message says which key to add).
import { ROLES, type Role } from '@/modules/accounts/core/roles';

export type Caller = Role | 'anonymous';

export interface RightsRow {
  /** The callers who get an answer; everyone else is refused (401 signed out, NOT_ALLOWED or 403 signed in). */
  who: readonly Caller[];
  /** Generated reads and relations: the arguments (filters, order, page) they take, and no others. */
  args?: readonly string[];
  /** Relations: the fields of the type they lead to, and no others (every caller in `who` reads them). */
  fields?: readonly string[];
  /** Variables for the probe, where the placeholders made from the argument types do not fit. */
  vars?: Record<string, unknown>;
  /** Routes: the JSON body of the probe, where an empty one does not reach the rights check. */
  body?: unknown;
}

export const STAFF: readonly Caller[] = ROLES;
export const ANYONE: readonly Caller[] = [...ROLES, 'anonymous'];
const MANAGER: readonly Caller[] = ['manager'];
/** Technicians and managers: the workshop. */
const BENCH: readonly Caller[] = ['technician', 'manager'];
/** Floor staff and managers: the buyer's side. */
const SELLERS: readonly Caller[] = ['floor', 'manager'];
/** Intake staff and managers: trade-ins and their inspections. */
const ASSESSORS: readonly Caller[] = ['intake', 'manager'];
/** Who sees what work costs: intake (the trade-in offer), the workshop and managers; not the floor. */
const COSTS: readonly Caller[] = ['intake', 'technician', 'manager'];

const PAGE = ['limit', 'offset'];
/** A colleague as anyone on the staff may see them: a name, never an e-mail, role or status. */
const STAFF_MEMBER = ['id', 'name'];

export const RIGHTS: Record<string, RightsRow> = {
  // ---- accounts
  'query me': { who: STAFF },
  // A manager reads every account; anyone else their own.
  'query user': { who: STAFF, args: ['idEq'] },
  'query users': { who: STAFF, args: [...PAGE] },
  'query team': { who: MANAGER },
  'mutation createUser': { who: MANAGER },
  'mutation changeUserRole': { who: MANAGER },
  'mutation setUserActive': { who: MANAGER },

  // ---- pianos
  'query piano': { who: STAFF, args: ['idEq', 'stockNumberEq'] },
  'query pianos': { who: STAFF, args: [...PAGE, 'range', 'stageEq', 'makerLikeNoCase', 'orderBy', 'orderByDesc'] },
  'relation Pianos.createdBy': { who: STAFF, args: [], fields: STAFF_MEMBER },
  'query stageCounts': { who: STAFF },
  'query stageHistory': { who: STAFF },
  // Each move is checked again by role and stage (stage machine); every role has some move.
  'mutation movePiano': { who: STAFF },
  'mutation createPiano': { who: ASSESSORS },

  // ---- assessment
  'query assessment': { who: STAFF, args: ['idEq'] },
  'query assessments': { who: STAFF, args: [...PAGE, 'pianoIdEq'] },
  'relation Assessments.submittedBy': { who: STAFF, args: [], fields: STAFF_MEMBER },
  'query gradeRules': { who: STAFF },
  'query assessmentHistory': { who: STAFF },
  'query samePianos': { who: ASSESSORS },
  // Where a piano came from; the seller's details only for readSellerDetails.
  'query intake': { who: STAFF },
  'mutation submitIntake': { who: ASSESSORS },
  'mutation correctAssessment': { who: ASSESSORS },
  'mutation setGradeRules': { who: MANAGER },
  'mutation submitRemeasurement': { who: BENCH },

  // ---- shop (the workshop)
  'query workItem': { who: BENCH, args: ['idEq'] },
  'query workItems': { who: BENCH, args: [...PAGE, 'pianoIdEq', 'statusEq'] },
  'query rateCard': { who: COSTS },
  'query workPlan': { who: COSTS },
  'query workQueue': { who: BENCH },
  'query workItemDetail': { who: BENCH },
  'query workshopOverruns': { who: MANAGER },
  'query climateReadings': { who: BENCH },
  'mutation decidePiano': { who: MANAGER },
  'mutation addWorkItem': { who: MANAGER },
  'mutation updateWorkItem': { who: MANAGER },
  'mutation removeWorkItem': { who: MANAGER },
  'mutation approvePlan': { who: MANAGER },
  'mutation startTimer': { who: BENCH },
  'mutation stopTimer': { who: BENCH },
  'mutation logTime': { who: BENCH },
  'mutation addPart': { who: BENCH },
  'mutation addWorkNote': { who: BENCH },
  'mutation setWorkItemDone': { who: BENCH },
  'mutation correctTimeEntry': { who: BENCH },
  'mutation finishWorkshop': { who: BENCH },
  'mutation logClimate': { who: BENCH },
  'mutation setRateCard': { who: MANAGER },

  // ---- deposits
  'query deposits': { who: SELLERS },
  'query depositRules': { who: STAFF },
  'mutation releaseHold': { who: MANAGER },
  'mutation refundDeposit': { who: MANAGER },
  'mutation recordSale': { who: SELLERS },
  'mutation markBalancePaid': { who: SELLERS },
  'mutation setDepositRules': { who: MANAGER },

  // ---- photos
  'query photos': { who: STAFF },
  'route POST /api/photos': { who: ['intake', 'technician', 'manager'] },

  // ---- tone
  'query toneRecordings': { who: STAFF },
  'mutation discardToneRecording': { who: STAFF },
  'route POST /api/recordings': { who: STAFF },

  // ---- jobs
  'query backgroundJobs': { who: MANAGER },
  'mutation retryBackgroundJob': { who: MANAGER },

  // ---- shop profile: the dealer's letterhead and locality every paper carries; the workshop's idle rule
  'query shopProfile': { who: STAFF },
  'mutation setShopProfile': { who: MANAGER },
  'query idleInWorkshop': { who: MANAGER },

  // ---- pricing
  // Anyone who reads pianos reaches it; each money field in it is checked again by role (tests/server/pricing.test.ts names them).
  'query pianoMoney': { who: STAFF },
  'mutation recordOfferAnswer': { who: ASSESSORS },
  'mutation changeAskingPrice': { who: MANAGER },
  'query pricingRules': { who: MANAGER },
  'mutation setPricingRules': { who: MANAGER },
  'query stockTable': { who: MANAGER },
  'query stockCharts': { who: MANAGER },
  'route GET /api/stock/export.csv': { who: MANAGER },

  // ---- disclosure
  'query disclosures': { who: STAFF },
  'query acknowledgements': { who: SELLERS },
  'query shopTexts': { who: STAFF },
  'mutation publishDisclosure': { who: SELLERS },
  'mutation countersign': { who: SELLERS },
  'mutation setAskingPrice': { who: MANAGER },
  'mutation setShopTexts': { who: MANAGER },
  'route GET /api/pianos/:id/floor-tag.pdf': { who: SELLERS },
  'route GET /api/acknowledgements/:id/signed.pdf': { who: SELLERS },
  // The buyer's side: anyone with the link.
  // Anyone holding a paper checks its verification code against the published version.
  'route GET /api/public/check/:code': { who: ANYONE },
  'route GET /api/public/check/:code/html': { who: ANYONE },
  // The catalogue of pianos on the floor: public, built from published disclosures only.
  'route GET /api/public/pianos': { who: ANYONE },
  'route GET /api/public/disclosures/:token': { who: ANYONE },
  'route GET /api/public/disclosures/:token/html': { who: ANYONE },
  'route POST /api/public/disclosures/:token/acknowledge': { who: ANYONE },
  'route GET /api/public/disclosures/:token/deposit': { who: ANYONE },
  'route POST /api/public/disclosures/:token/deposit': { who: ANYONE },
  'route POST /api/public/disclosures/:token/balance': { who: ANYONE },
  'route GET /api/public/receipts/:token.pdf': { who: ANYONE },
  'route POST /api/webhooks/payments': { who: ANYONE },

  // ---- the server itself
  'route GET /healthz': { who: ANYONE },
  // Anyone may sign in: the probe signs in as floor staff whoever sends it.
  'route POST /auth/login': { who: ANYONE, body: { email: 'floor@feltwire.test', password: 'feltwire-demo' } },
  'route GET /graphql': { who: STAFF },
  'route POST /graphql': { who: STAFF },
  // The demo inbox from another machine (it also opens on the machine running the server).
  'route GET /dev/inbox': { who: MANAGER },
  'route GET /dev/inbox.json': { who: MANAGER },
  'route GET /dev/inbox/:id/attachments/:n': { who: MANAGER },
};
