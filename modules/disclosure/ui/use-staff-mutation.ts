import { useGuardedMutation } from '@/modules/accounts/ui/use-guarded-mutation';

export type { MutationOutcome } from '@/modules/accounts/ui/use-guarded-mutation';

// A move through the stages changes a piano: naming the type refreshes every cached piano query.
const TOUCHES_PIANOS = ['Pianos'];

/** Runs one mutation of the disclosure and deposit desks; panels ask for their JSON answers again after. */
export function useStaffMutation<T, V extends Record<string, unknown>>(document: string, field: string) {
  return useGuardedMutation<T, V>(document, field, TOUCHES_PIANOS, 'Still working on the last command: wait a moment.');
}
