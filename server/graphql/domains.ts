import { accountsGraph } from '@/modules/accounts/server/user-graphql';
import { assessmentGraph } from '@/modules/assessment/server/assessment-graphql';
import { depositsGraph } from '@/modules/deposits/server/deposit-graphql';
import { disclosureGraph } from '@/modules/disclosure/server/disclosure-graphql';
import { jobsGraph } from '@/modules/jobs/server/jobs-graphql';
import { photosGraph } from '@/modules/photos/server/photo-graphql';
import { shopGraph } from '@/modules/shop/server/shop-graphql';
import { shopProfileGraph } from '@/modules/shop/server/shop-profile-graphql';
import { pianosGraph } from '@/modules/pianos/server/piano-graphql';
import { pricingGraph } from '@/modules/pricing/server/pricing-graphql';
import { toneGraph } from '@/modules/tone/server/tone-graphql';

import type { GraphDomain } from './domain';

// Every domain that adds to the GraphQL schema: a new domain adds one line here.
export const DOMAINS: GraphDomain[] = [accountsGraph, pianosGraph, assessmentGraph, photosGraph, shopGraph, shopProfileGraph, disclosureGraph, depositsGraph, toneGraph, jobsGraph, pricingGraph];
