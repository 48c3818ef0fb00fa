import type { User } from '@/modules/accounts/server/user-model';
import type { DepositDeps } from '@/modules/deposits/server/deposit-service';
import type { DisclosureDeps } from '@/modules/disclosure/server/disclosure-service';
import type { PhotoStore } from '@/modules/photos/server/photo-store';
import type { PricingDeps } from '@/modules/pricing/server/pricing-service';

// What every resolver gets: the signed-in, active user (loaded fresh for each request) and the services.
export type GraphContext = {
  user: User;
  photos: PhotoStore;
  disclosure: DisclosureDeps;
  deposits: DepositDeps;
  pricing: PricingDeps;
};
