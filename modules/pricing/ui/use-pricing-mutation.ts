import { useGuardedMutation } from '@/modules/accounts/ui/use-guarded-mutation';

export type { MutationOutcome } from '@/modules/accounts/ui/use-guarded-mutation';

// A price or an answer changes the piano's money, the stock table and the charts: each says it depends on these.
export const PRICING_TYPENAMES = ['PianoMoney', 'StockTablePage', 'StockCharts', 'Pianos'];
export const PRICING_CONTEXT = { additionalTypenames: PRICING_TYPENAMES };

export function usePricingMutation<T, V extends Record<string, unknown>>(document: string, field: string) {
  return useGuardedMutation<T, V>(document, field, PRICING_TYPENAMES, 'Still saving the last change: wait a moment.');
}
