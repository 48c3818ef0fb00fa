import { useCallback, useEffect } from 'react';
import { useQuery } from 'urql';

import { withFragments } from '@/modules/api/ui/document';
import type { DepositRulesQuery, DepositsQuery, DepositsQueryVariables, RecordSaleMutation, RefundDepositMutation, ReleaseHoldMutation, SetDepositRulesMutation } from '@/modules/api/ui/graphql-types';
import type { MutationData } from '@/modules/accounts/ui/use-guarded-mutation';
import type { DepositRules } from '@/modules/deposits/core/deposit';
import { useStaffMutation } from '@/modules/disclosure/ui/use-staff-mutation';
import type { Stage } from '@/modules/pianos/core/piano';

const DEPOSIT_PARTS = /* GraphQL */ `
  fragment DepositParts on Deposit { id pianoId status amountMinor currency buyerName buyerEmail createdAt paidAt holdExpiresAt closedAt refundedMinor refundId closeReason }
`;
const BALANCE_PARTS = /* GraphQL */ `
  fragment BalanceParts on Balance { priceMinor taxMinor totalMinor depositMinor balanceMinor currency salesTaxPct }
`;

export const DEPOSITS_QUERY = withFragments(
  /* GraphQL */ `
    query Deposits($pianoId: Int!) {
      deposits(pianoId: $pianoId) { deposits { ...DepositParts } balance { ...BalanceParts } rules { percent minimumMajor holdDays salesTaxPct } }
    }
  `,
  DEPOSIT_PARTS,
  BALANCE_PARTS,
);
const RULES_QUERY = /* GraphQL */ `
  query DepositRules {
    depositRules { percent minimumMajor holdDays salesTaxPct }
  }
`;
const STAGE_QUERY = 'query PianoStage($id: Int) { piano(idEq: $id) { id stockNumber stage askingPriceMinor priceCurrency } }';

export type PianoDeposits = DepositsQuery['deposits'];
export type DepositRow = PianoDeposits['deposits'][number];

// The balance is worked out from the piano's price: a price change asks again.
const DEPOSITS_CONTEXT = { additionalTypenames: ['Pianos'] };

/** A piano's deposits, the balance due and the rules; asked again every `everyMs` so a hold paid online shows up. */
export function usePianoDeposits(pianoId: number, everyMs = 10_000) {
  const [result, reexecute] = useQuery<DepositsQuery, DepositsQueryVariables>({ query: DEPOSITS_QUERY, variables: { pianoId }, context: DEPOSITS_CONTEXT, requestPolicy: 'cache-and-network' });
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
  const [result, reexecute] = useQuery<DepositRulesQuery>({ query: RULES_QUERY, requestPolicy: 'cache-and-network' });
  const refresh = useCallback(() => reexecute({ requestPolicy: 'network-only' }), [reexecute]);
  return { rules: result.data?.depositRules ?? null, error: result.error, refresh };
}

export function useReleaseHold() {
  return useStaffMutation<MutationData<ReleaseHoldMutation>, { depositId: number; refund: boolean; why: string | null }>(
    withFragments(
      /* GraphQL */ `
        mutation ReleaseHold($depositId: Int!, $refund: Boolean!, $why: String) {
          releaseHold(depositId: $depositId, refund: $refund, why: $why) { ...DepositParts }
        }
      `,
      DEPOSIT_PARTS,
    ),
    'releaseHold',
  );
}

export function useRefundDeposit() {
  return useStaffMutation<MutationData<RefundDepositMutation>, { depositId: number }>(
    withFragments(
      /* GraphQL */ `
        mutation RefundDeposit($depositId: Int!) {
          refundDeposit(depositId: $depositId) { ...DepositParts }
        }
      `,
      DEPOSIT_PARTS,
    ),
    'refundDeposit',
  );
}

export function useRecordSale() {
  return useStaffMutation<MutationData<RecordSaleMutation>, { pianoId: number }>(
    withFragments(
      /* GraphQL */ `
        mutation RecordSale($pianoId: Int!) {
          recordSale(pianoId: $pianoId) { stage balance { ...BalanceParts } }
        }
      `,
      BALANCE_PARTS,
    ),
    'recordSale',
  );
}

export function useRecordDelivery() {
  return useStaffMutation<{ id: number; stage: Stage }, { pianoId: number }>('mutation RecordDelivery($pianoId: Int!) { movePiano(pianoId: $pianoId, action: "deliver") { id stage } }', 'movePiano');
}

export function useSetDepositRules() {
  return useStaffMutation<MutationData<SetDepositRulesMutation>, { r: DepositRules }>(
    /* GraphQL */ `
      mutation SetDepositRules($r: DepositRulesInput!) {
        setDepositRules(rules: $r) { percent minimumMajor holdDays salesTaxPct }
      }
    `,
    'setDepositRules',
  );
}
