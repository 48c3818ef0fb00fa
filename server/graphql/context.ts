import type { User } from '@/modules/accounts/server/user-model';

// What every resolver gets: the signed-in, active user (loaded fresh for each request).
export type GraphContext = {
  user: User;
};
