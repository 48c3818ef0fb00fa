import bcrypt from 'bcrypt';

import { can, type Role } from '@/modules/accounts/core/roles';
import { loginInput, newUserInput, roleChangeInput } from '@/modules/accounts/core/user-input';
import { NO_CONTROL_CHARACTERS } from '@/modules/input/core/text';
import { AppError, notAllowed, notFound } from '@/server/errors';

import { User } from './user-model';

const BCRYPT_COST = Number(process.env.BCRYPT_COST ?? 12);
// Compared against when the e-mail is unknown, so both failures take the same time.
const DUMMY_HASH = bcrypt.hashSync('no-such-user-placeholder', 4).replace(/^\$2b\$04\$/, `$2b$${String(BCRYPT_COST).padStart(2, '0')}$`);

export type Actor = Pick<User, 'id' | 'role'>;

export function hashPassword(password: string): Promise<string> {
  return bcrypt.hash(password, BCRYPT_COST);
}

/** The user for this e-mail and password, or null: unknown e-mail, wrong password and deactivated look alike. */
export async function authenticate(raw: unknown): Promise<User | null> {
  const parsed = loginInput.safeParse(raw);
  if (!parsed.success) {
    // A control character is told as such; a missing or mistyped field looks like any wrong sign-in.
    if (parsed.error.issues.some((i) => i.message === NO_CONTROL_CHARACTERS)) throw parsed.error;
    return null;
  }
  const email = parsed.data.email.trim().toLowerCase();
  const user = await User.query().findOne({ email });
  const ok = await bcrypt.compare(parsed.data.password, user?.passwordHash ?? DUMMY_HASH);
  if (!user || !ok || !user.active) return null;
  return user;
}

export async function findActiveUser(id: number): Promise<User | undefined> {
  return User.query().findById(id).where('active', true);
}

function requireManager(actor: Actor, what: string): void {
  if (!can(actor.role, 'manageUsers')) throw notAllowed(what);
}

export async function listUsers(actor: Actor): Promise<User[]> {
  requireManager(actor, 'list users');
  return User.query().orderBy('name');
}

export async function createUser(actor: Actor, raw: unknown): Promise<User> {
  requireManager(actor, 'create users');
  const input = newUserInput.parse(raw);
  const passwordHash = await hashPassword(input.password);
  return User.query().insert({ email: input.email, name: input.name, role: input.role, passwordHash, active: true });
}

async function loadOther(actor: Actor, userId: number, what: string): Promise<User> {
  if (userId === actor.id) throw new AppError('BAD_INPUT', `userId: you cannot ${what} your own account`, 'userId');
  const user = await User.query().findById(userId);
  if (!user) throw notFound(`user ${userId}`);
  return user;
}

export async function changeRole(actor: Actor, raw: unknown): Promise<User> {
  requireManager(actor, 'change roles');
  const input = roleChangeInput.parse(raw);
  const user = await loadOther(actor, input.userId, 'change the role of');
  return user.$query().patchAndFetch({ role: input.role as Role });
}

export async function setActive(actor: Actor, userId: number, active: boolean): Promise<User> {
  requireManager(actor, active ? 'reactivate users' : 'deactivate users');
  const user = await loadOther(actor, userId, active ? 'reactivate' : 'deactivate');
  return user.$query().patchAndFetch({ active });
}
