import { useGuardedMutation } from '@/modules/accounts/ui/use-guarded-mutation';

export type { MutationOutcome } from '@/modules/accounts/ui/use-guarded-mutation';

/**
 * Workshop answers are JSON, which urql's document cache cannot trace to a type. Every workshop query
 * says it depends on these type names and every workshop mutation says it touches them, so any change
 * made here asks the workshop (and piano) queries on screen again.
 */
export const SHOP_TYPENAMES = ['Pianos', 'Assessments', 'WorkItems'];
export const SHOP_CONTEXT = { additionalTypenames: SHOP_TYPENAMES };

/** Runs one workshop mutation and hands back its answer or the server's problem in words. */
export function useShopMutation<T, V extends Record<string, unknown>>(document: string, field: string) {
  return useGuardedMutation<T, V>(document, field, SHOP_TYPENAMES, 'Still saving the last change: wait a moment.');
}
