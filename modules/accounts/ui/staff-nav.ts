// One nav definition for both layouts of the staff shell (bottom bar on a phone, side nav when wide).
import { can, type Ability, type Role } from '@/modules/accounts/core/roles';

export interface NavItem {
  label: string;
  href: string;
  /** a short line under the label in the side nav */
  hint: string;
}

const PIANOS: NavItem = { label: 'Pianos', href: '/pianos', hint: 'Every piano in stock' };

export const NAV_ITEMS: Record<Role, readonly NavItem[]> = {
  intake: [{ label: 'Trade-ins', href: '/trade-ins', hint: 'Take pianos in' }, PIANOS],
  technician: [{ label: 'Bench', href: '/bench', hint: 'The work queue' }, { label: 'Climate', href: '/workshop/climate', hint: 'Air and wood moisture' }, PIANOS],
  floor: [{ label: 'Showroom', href: '/showroom', hint: 'Pianos on the floor' }, PIANOS],
  manager: [
    { label: 'Stock', href: '/stock', hint: 'Counts, the stock table, charts' },
    { label: 'Workshop', href: '/workshop', hint: 'Plans, overruns, rates' },
    { label: 'Deposits', href: '/present/rules', hint: 'Deposit rules and holds' },
    { label: 'Team', href: '/team', hint: 'Accounts and roles' },
    PIANOS,
  ],
};

export const ROLE_HOME: Record<Role, string> = {
  intake: '/trade-ins',
  technician: '/bench',
  floor: '/showroom',
  manager: '/stock',
};

// Pages that belong to the roles with an ability; a path not listed is open to every signed-in role.
const OWNED_PATHS: readonly { prefix: string; ability: Ability }[] = [
  { prefix: '/trade-ins', ability: 'createPianos' },
  { prefix: '/bench', ability: 'workAtBench' },
  { prefix: '/workshop/rates', ability: 'setRates' },
  { prefix: '/workshop/overruns', ability: 'planWork' },
  { prefix: '/workshop/grading', ability: 'setGradeRules' },
  { prefix: '/workshop', ability: 'workAtBench' },
  { prefix: '/present/rules', ability: 'manageDeposits' },
  { prefix: '/present/texts', ability: 'editShopTexts' },
  { prefix: '/present', ability: 'showToBuyers' },
  { prefix: '/showroom', ability: 'showToBuyers' },
  { prefix: '/stock', ability: 'overseeStock' },
  { prefix: '/team', ability: 'manageUsers' },
];

const under = (path: string, prefix: string) => path === prefix || path.startsWith(`${prefix}/`);

/** Where a role is sent when it opens a page that is not its own: its home; null when it may stay. */
export function redirectFor(role: Role, pathname: string): string | null {
  const owner = OWNED_PATHS.find((p) => under(pathname, p.prefix));
  if (!owner || can(role, owner.ability)) return null;
  return ROLE_HOME[role];
}

/** The nav item a path falls under, for marking the current item. */
export function currentNavHref(role: Role, pathname: string): string | null {
  const match = NAV_ITEMS[role].filter((item) => under(pathname, item.href)).sort((a, b) => b.href.length - a.href.length)[0];
  return match?.href ?? null;
}

/** Only same-site paths are followed after sign-in. */
export function safeNextPath(next: unknown): string | null {
  if (typeof next !== 'string' || !next.startsWith('/') || next.startsWith('//') || next.startsWith('/sign-in')) return null;
  return next;
}
