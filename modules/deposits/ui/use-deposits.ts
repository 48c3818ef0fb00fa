import { useCallback, useEffect } from 'react';
import { useQuery } from 'urql';

import type { Balance, DepositRules } from '@/modules/deposits/core/deposit';
import { useStaffMutation } from '@/modules/disclosure/ui/use-staff-mutation';
import type { Stage } from '@/modules/pianos/core/piano';

import type { DepositStatus } from './public-deposit';

export interface DepositRow {
  id: number;
  status: DepositStatus;
  amountMinor: number;
  currency: string;
  buyerName: string;
  buyerEmail: string;
  createdAt: string;
  paidAt: string | null;
  holdExpiresAt: string | null;
  closedAt: string | null;
  refundedMinor: number;
  refundId: string | null;
  closeReason: string | null;
}

export interface PianoDeposits {
  deposits: DepositRow[];
  balance: Balance | null;
  rules: DepositRules;
}

const DEPOSITS_QUERY = 'query Deposits($pianoId: Int!) { deposits(pianoId: $pianoId) }';
const RULES_QUERY = 'query DepositRules { depositRules }';
const STAGE_QUERY = 'query PianoStage($id: Int) { piano(idEq: $id) { id stockNumber stage askingPriceMinor priceCurrency } }';

// The balance is worked out from the piano's price (JSON, so untraced by the cache): a price change asks again.
const DEPOSITS_CONTEXT = { additionalTypenames: ['Pianos'] };

/** A piano's deposits, the balance due and the rules; asked again every `everyMs` so a hold paid online shows up. */
export function usePianoDeposits(pianoId: number, everyMs = 10_000) {
  const [result, reexecute] = useQuery<{ deposits: PianoDeposits }>({ query: DEPOSITS_QUERY, variables: { pianoId }, context: DEPOSITS_CONTEXT, requestPolicy: 'cache-and-network' });
  const refresh = useCallback(() => reexecute({ requestPolicy: 'network-only' }), [reexecute]);
  useEffect(() => {
    if (!everyMs) return;
    const timer = setInterval(refresh, everyMs);
    return () => clearInterval(timer);
  }, [refresh, everyMs]);
  return { data: result.data?.deposits ?? null, error: result.error, refresh };
}

/** The piano's stage, to offer the sale and the delivery at the right time. */
export function usePianoStage(pianoId: number) {
  const [result, reexecute] = useQuery<{ piano: { id: number; stockNumber: string; stage: Stage; askingPriceMinor: number | null; priceCurrency: string | null } | null }>({
    query: STAGE_QUERY,
    variables: { id: pianoId },
    requestPolicy: 'cache-and-network',
  });
  const refresh = useCallback(() => reexecute({ requestPolicy: 'network-only' }), [reexecute]);
  return { piano: result.data?.piano ?? null, error: result.error, refresh };
}

export function useDepositRules() {
  const [result, reexecute] = useQuery<{ depositRules: DepositRules }>({ query: RULES_QUERY, requestPolicy: 'cache-and-network' });
  const refresh = useCallback(() => reexecute({ requestPolicy: 'network-only' }), [reexecute]);
  return { rules: result.data?.depositRules ?? null, error: result.error, refresh };
}

export function useReleaseHold() {
  return useStaffMutation<DepositRow, { depositId: number; refund: boolean; why: string | null }>(
    'mutation ReleaseHold($depositId: Int!, $refund: Boolean!, $why: String) { releaseHold(depositId: $depositId, refund: $refund, why: $why) }',
    'releaseHold',
  );
}

export function useRefundDeposit() {
  return useStaffMutation<DepositRow, { depositId: number }>('mutation RefundDeposit($depositId: Int!) { refundDeposit(depositId: $depositId) }', 'refundDeposit');
}

export function useRecordSale() {
  return useStaffMutation<{ stage: Stage; balance: Balance | null }, { pianoId: number }>('mutation RecordSale($pianoId: Int!) { recordSale(pianoId: $pianoId) }', 'recordSale');
}

export function useRecordDelivery() {
  return useStaffMutation<{ id: number; stage: Stage }, { pianoId: number }>('mutation RecordDelivery($pianoId: Int!) { movePiano(pianoId: $pianoId, action: "deliver") { id stage } }', 'movePiano');
}

export function useSetDepositRules() {
  return useStaffMutation<DepositRules, { r: DepositRules }>('mutation SetDepositRules($r: JSON!) { setDepositRules(rules: $r) }', 'setDepositRules');
}
