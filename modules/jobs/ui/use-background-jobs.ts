import { useQuery } from 'urql';

import { useGuardedMutation } from '@/modules/accounts/ui/use-guarded-mutation';
import type { BackgroundJobView } from '@/modules/jobs/core/job-kinds';

export type BackgroundJob = BackgroundJobView;

export const BACKGROUND_JOBS_QUERY = 'query BackgroundJobs { backgroundJobs { id task label about state stateText attempts maxAttempts lastError nextTryAt startedAt createdAt } }';
const TYPENAMES = ['BackgroundJob'];
// Kept outside the hook: a new context object each render would ask the server again each render.
const CONTEXT = { additionalTypenames: TYPENAMES };

/** Background jobs that failed, gave up or stalled (managers only). */
export function useBackgroundJobs() {
  const [result, reexecute] = useQuery<{ backgroundJobs: BackgroundJob[] }>({ query: BACKGROUND_JOBS_QUERY, requestPolicy: 'cache-and-network', context: CONTEXT });
  return { jobs: result.data?.backgroundJobs ?? null, error: result.error, fetching: result.fetching, refresh: () => reexecute({ requestPolicy: 'network-only' }) };
}

export function useRetryBackgroundJob() {
  return useGuardedMutation<boolean, { id: string }>('mutation RetryBackgroundJob($id: ID!) { retryBackgroundJob(id: $id) }', 'retryBackgroundJob', TYPENAMES, 'Already starting it again: wait a moment.');
}
